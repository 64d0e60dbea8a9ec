/**
 * What each chart of the loading desk plots: columns, names, units. Strain mm/mm, stress and
 * energy density MPa, damage dimensionless, x "increment" = the increment column.
 */
import type { ResultColumn } from "@/lib/mechanics/types";

export interface SeriesDef {
  key: string;
  x: ResultColumn;
  y: ResultColumn;
  name: string;
  dash: "solid" | "dash" | "dot";
  /** The name when x is not the series' own (e.g. "Ȳ1" for "Ȳ1 vs d1"); else `name` stays. */
  nameAlone?: string;
}

export interface ChartDef {
  key: string;
  title: string;
  /** What is plotted, for "<subject> against <x>" titles when the horizontal axis changes. */
  subject: string;
  /** The horizontal axis drawn now, and the ones this chart offers (the first is its default). */
  xAxis: XAxisChoice;
  xChoices: readonly XAxisChoice[];
  xTitle: string;
  yTitle: string;
  xUnit: string;
  yUnit: string;
  series: SeriesDef[];
  /** Whether onset / peak / failure marks are drawn. */
  marks: boolean;
}

import type { XAxisChoice } from "./chart-x-axis";
import {
  STRAIN_LABEL,
  STRESS_LABEL,
  type StrainComponent,
  type StressComponent,
} from "@/lib/shared/quantity-symbols";

export type { StrainComponent, StressComponent };
export { STRAIN_LABEL, STRESS_LABEL };

export function stressStrainDef(x: StrainComponent, y: StressComponent): ChartDef {
  return {
    key: "stress-strain",
    title: `Stress–strain: ${STRESS_LABEL[y]} against ${STRAIN_LABEL[x]}`,
    subject: `Stress–strain: ${STRESS_LABEL[y]}`,
    // its own pickers choose the strain component (chart-grid)
    xAxis: x,
    xChoices: [x],
    xTitle: `${STRAIN_LABEL[x]} (mm/mm)`,
    yTitle: `${STRESS_LABEL[y]} (MPa)`,
    xUnit: "mm/mm",
    yUnit: "MPa",
    series: [{ key: "curve", x, y, name: `${STRESS_LABEL[y]}–${STRAIN_LABEL[x]}`, dash: "solid" }],
    marks: true,
  };
}

const overIncrements = (
  key: string,
  y: ResultColumn,
  name: string,
  dash: SeriesDef["dash"],
): SeriesDef => ({
  key,
  x: "increment",
  y,
  name,
  dash,
});

// Against the increment, any strain and any stress component (damage or permanent strain against
// σ11 reads as a threshold curve); energy and the thermodynamic force against strain, not stress.
const HISTORY_X: readonly XAxisChoice[] = [
  "increment",
  "eps11",
  "eps22",
  "gam12",
  "sig11",
  "sig22",
  "sig12",
];
const STRAIN_X: readonly XAxisChoice[] = ["increment", "eps11", "eps22", "gam12"];

export const FIXED_CHARTS: readonly ChartDef[] = [
  {
    key: "damage",
    title: "Damage against increment",
    subject: "Damage",
    xAxis: "increment",
    xChoices: HISTORY_X,
    xTitle: "increment",
    yTitle: "damage (–)",
    xUnit: "",
    yUnit: "",
    series: [overIncrements("d1", "d1", "d1", "solid"), overIncrements("d2", "d2", "d2", "dash")],
    marks: true,
  },
  {
    key: "force",
    title: "Thermodynamic force against damage",
    subject: "Thermodynamic force",
    xAxis: "damage",
    xChoices: ["damage", ...STRAIN_X],
    xTitle: "damage d (–)",
    yTitle: "Ȳ (MPa)",
    xUnit: "",
    yUnit: "MPa",
    series: [
      { key: "f1", x: "d1", y: "Ybar1", name: "Ȳ1 vs d1", nameAlone: "Ȳ1", dash: "solid" },
      { key: "f2", x: "d2", y: "Ybar2", name: "Ȳ2 vs d2", nameAlone: "Ȳ2", dash: "dash" },
    ],
    marks: false,
  },
  {
    key: "permanent-strain",
    title: "Permanent strain against increment",
    subject: "Permanent strain",
    xAxis: "increment",
    xChoices: HISTORY_X,
    xTitle: "increment",
    yTitle: "εp (mm/mm)",
    xUnit: "",
    yUnit: "mm/mm",
    series: [
      overIncrements("p11", "epsP11", "εp11", "solid"),
      overIncrements("p22", "epsP22", "εp22", "dash"),
      overIncrements("p12", "gamP12", "γp12", "dot"),
    ],
    marks: false,
  },
  {
    key: "energy",
    title: "Work, stored and dissipated energy",
    subject: "Work, stored and dissipated energy",
    xAxis: "increment",
    xChoices: STRAIN_X,
    xTitle: "increment",
    yTitle: "W, ψ, Φ (MPa = MJ/m³)",
    xUnit: "",
    yUnit: "MPa",
    series: [
      overIncrements("W", "W", "W work in", "solid"),
      overIncrements("psi", "psi", "ψ stored", "dash"),
      overIncrements("Phi", "Phi", "Φ dissipated", "dot"),
    ],
    marks: false,
  },
];

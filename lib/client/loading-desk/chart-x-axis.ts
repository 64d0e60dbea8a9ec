/**
 * The horizontal axis a loading desk chart may be drawn against: the increment, a strain or a
 * stress component, or (for the thermodynamic force chart) each family's own damage. Strain
 * mm/mm, stress MPa, increment and damage without unit.
 */
import type { ResultColumn } from "@/lib/mechanics/types";
import {
  STRAIN_LABEL,
  STRESS_LABEL,
  type StrainComponent,
  type StressComponent,
} from "@/lib/shared/quantity-symbols";
import type { ChartDef } from "./chart-defs";

/** "damage" = each series' own damage (d1 for Ȳ1, d2 for Ȳ2), only where a chart is defined so. */
export type XAxisChoice = "increment" | "damage" | StrainComponent | StressComponent;

export const STRAIN_CHOICES: readonly StrainComponent[] = ["eps11", "eps22", "gam12"];
export const STRESS_CHOICES: readonly StressComponent[] = ["sig11", "sig22", "sig12"];

export function xAxisSymbol(choice: XAxisChoice): string {
  if (choice === "increment") return "increment";
  if (choice === "damage") return "damage d";
  return STRAIN_LABEL[choice as StrainComponent] ?? STRESS_LABEL[choice as StressComponent];
}

export function xAxisUnit(choice: XAxisChoice): string {
  if (choice === "increment" || choice === "damage") return "";
  return choice in STRAIN_LABEL ? "mm/mm" : "MPa";
}

/** The axis title with its unit: "ε11 (mm/mm)", "σ12 (MPa)", "damage d (–)", "increment". */
export function xAxisTitle(choice: XAxisChoice): string {
  if (choice === "increment") return "increment";
  if (choice === "damage") return "damage d (–)";
  return `${xAxisSymbol(choice)} (${xAxisUnit(choice)})`;
}

/**
 * The chart drawn against `choice`: every series takes that column as x, the title and axis say
 * so. The chart's own axis, or one it does not offer, gives the chart back unchanged.
 */
export function withXAxis(def: ChartDef, choice: XAxisChoice): ChartDef {
  if (choice === def.xAxis || choice === "damage" || !def.xChoices.includes(choice)) return def;
  const column: ResultColumn = choice;
  return {
    ...def,
    xAxis: choice,
    title: `${def.subject} against ${xAxisSymbol(choice)}`,
    xTitle: xAxisTitle(choice),
    xUnit: xAxisUnit(choice),
    series: def.series.map((s) => ({ ...s, x: column, name: s.nameAlone ?? s.name })),
  };
}

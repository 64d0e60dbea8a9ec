/**
 * Column headings of the results CSV a person downloads from the loading desk (issue 15 item 3):
 * the quantity's symbol, a space and its unit in square brackets, one header line that a
 * spreadsheet and pandas read without options and that lib/csv's unit reader understands
 * ("[-]" is a dimensionless strain). Units after scenario-file.md: strains mm/mm, stresses and
 * energies per unit volume MPa, thetaD degrees. The command line's contract CSV keeps the bare
 * names (lib/scenario/results-csv).
 */
import type { ResultColumn } from "@/lib/mechanics/types";
import { csvSignificant } from "@/lib/shared/csv-writer";

export const EXPORT_HEADINGS: Record<ResultColumn, string> = {
  increment: "increment",
  leg: "leg",
  eps11: "ε11 [-]",
  eps22: "ε22 [-]",
  gam12: "γ12 [-]",
  sig11: "σ11 [MPa]",
  sig22: "σ22 [MPa]",
  sig12: "σ12 [MPa]",
  d1: "d1 [-]",
  d2: "d2 [-]",
  dp1: "dp1 [-]",
  dp2: "dp2 [-]",
  epsP11: "εp11 [-]",
  epsP22: "εp22 [-]",
  gamP12: "γp12 [-]",
  Y1: "Y1 [MPa]",
  Y2: "Y2 [MPa]",
  Ybar1: "Ȳ1 [MPa]",
  Ybar2: "Ȳ2 [MPa]",
  psi: "ψ [MPa]",
  W: "W [MPa]",
  Phi: "Φ [MPa]",
  thetaD: "θd [deg]",
  failed: "failed [0/1]",
};

/** Significant digits of every number in the export: the core's tolerances are far coarser. */
export const EXPORT_SIGNIFICANT_DIGITS = 10;

/** One number of the export: the one CSV writer's rounding to the stated digits. */
export function exportNumber(value: number): string {
  return csvSignificant(value, EXPORT_SIGNIFICANT_DIGITS);
}

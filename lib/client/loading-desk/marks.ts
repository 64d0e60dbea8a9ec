/**
 * Notable rows of a run, marked on the charts: damage onset (first row with d1 or d2 > 0),
 * peak (largest |stress| of the chosen component) and failure (first row flagged failed).
 * When the path goes on past that row (onFailure 'continue'), the row is where a crack family
 * broke (spec C.7: d := dmax, no further evolution), and the mark says which family.
 */
import type { ResultColumns } from "@/lib/mechanics/types";

export interface RunMarks {
  onset: number | null;
  peak: number | null;
  failure: number | null;
  /** the family that broke at the failure row when rows follow it; null when the path stopped */
  broken: 1 | 2 | null;
}

export function findMarks(
  cols: ResultColumns,
  rows: number,
  stress: "sig11" | "sig22" | "sig12",
): RunMarks {
  let onset: number | null = null;
  let failure: number | null = null;
  let peak: number | null = null;
  let best = 0;
  const s = cols[stress];
  for (let i = 0; i < rows; i++) {
    if (onset === null && (cols.d1[i] > 0 || cols.d2[i] > 0)) onset = i;
    if (failure === null && cols.failed[i] !== 0) failure = i;
    const m = Math.abs(s[i]);
    if (m > best) {
      best = m;
      peak = i;
    }
  }
  let broken: 1 | 2 | null = null;
  if (failure !== null && failure < rows - 1) broken = cols.d1[failure] >= cols.d2[failure] ? 1 : 2;
  return { onset, peak, failure, broken };
}

/**
 * Notable rows of a run, marked on the charts: damage onset (first row with d1 or d2 > 0),
 * peak (largest |stress| of the chosen component) and failure (first row flagged failed).
 */
import type { ResultColumns } from "@/lib/mechanics/types";

export interface RunMarks {
  onset: number | null;
  peak: number | null;
  failure: number | null;
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
  return { onset, peak, failure };
}

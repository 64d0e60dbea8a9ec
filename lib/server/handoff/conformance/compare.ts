import "server-only";

/**
 * Compares an uploaded history with Craquelure's replay, quantity by quantity: max absolute,
 * RMS and max relative deviation, and the first increment where the deviation exceeds the
 * tolerance (stresses: a fraction of the peak stress magnitude; damage: absolute).
 */
import type { ResultColumns } from "@/lib/mechanics/types";

import type { History } from "./read-history";
import {
  COMPARED_QUANTITIES,
  type ConformanceResult,
  type ConformanceTolerance,
  type QuantityComparison,
} from "./types";

/** Relative errors are taken only where Craquelure's value exceeds this share of the peak. */
const RELATIVE_FLOOR = 1e-3;

export function peakStress(columns: ResultColumns, rowOf: Int32Array): number {
  let peak = 0;
  for (const q of ["sig11", "sig22", "sig12"] as const) {
    for (const row of rowOf) if (row >= 0) peak = Math.max(peak, Math.abs(columns[q][row]));
  }
  return peak;
}

export function compareHistory(
  setId: string,
  history: History,
  columns: ResultColumns,
  rowOf: Int32Array,
  tolerance: ConformanceTolerance,
): ConformanceResult {
  const peak = peakStress(columns, rowOf);
  const increment = (i: number) => (history.increment ? history.increment[i] : i);
  const quantities: QuantityComparison[] = [];
  for (const quantity of COMPARED_QUANTITIES) {
    const theirs = history[quantity];
    if (!theirs) continue;
    const ours = columns[quantity];
    const isDamage = quantity === "d1" || quantity === "d2";
    const tol = isDamage ? tolerance.damage : tolerance.stressFraction * peak;
    const scale = isDamage ? 1 : peak;
    let maxAbs = 0;
    let sumSq = 0;
    let maxRel = 0;
    let count = 0;
    let firstFail: number | null = null;
    for (let i = 0; i < history.rows; i++) {
      const row = rowOf[i];
      // A row Craquelure never reached (its run stopped at a failure) counts as a miss.
      const diff = row < 0 ? Infinity : Math.abs(theirs[i] - ours[row]);
      if (row >= 0) {
        sumSq += diff * diff;
        count++;
        const ref = Math.abs(ours[row]);
        if (ref > RELATIVE_FLOOR * scale) maxRel = Math.max(maxRel, diff / ref);
      }
      maxAbs = Math.max(maxAbs, diff);
      if (firstFail === null && !(diff <= tol)) firstFail = increment(i);
    }
    quantities.push({
      quantity,
      tolerance: tol,
      maxAbs: Number.isFinite(maxAbs) ? maxAbs : Number.MAX_VALUE,
      rms: count > 0 ? Math.sqrt(sumSq / count) : 0,
      maxRel,
      firstFailIncrement: firstFail,
      passed: firstFail === null,
    });
  }
  const fails = quantities.map((q) => q.firstFailIncrement).filter((x): x is number => x !== null);
  return {
    setId,
    tolerance,
    points: history.rows,
    peakStress: peak,
    quantities,
    passed: fails.length === 0,
    firstFailIncrement: fails.length > 0 ? Math.min(...fails) : null,
  };
}

/**
 * Spec E.2 (loop acceptance) and E.3 (per-loop unloading modulus, residual strain, reloading
 * slope and chord). A loop k is peak_k → valley_k → next peak; the unloading branch carries the
 * modulus because on it no damage grows.
 */
import { leastSquaresLine } from "./line-fit";
import type { TurningPoints } from "./turning-points";

export interface LoopModulus {
  peakIndex: number;
  valleyIndex: number;
  epsMax: number;
  sigMax: number;
  sigValley: number;
  partial: boolean;
  E: number;
  epsR: number;
  r2: number;
  seE: number;
  reloadE: number | null;
  chordE: number | null;
  hysteresis: boolean;
}

export interface RejectedLoop {
  peakIndex: number;
  reason: string;
}

/** Stress window of the fits: [0.1, 0.9]·sigMax, or 10 % inside a partial loop's range. */
function fitWindow(sigMax: number, sigValley: number, partial: boolean): [number, number] {
  if (!partial) return [0.1 * sigMax, 0.9 * sigMax];
  const span = sigMax - sigValley;
  return [sigValley + 0.1 * span, sigMax - 0.1 * span];
}

export function measureLoops(
  strain: Float64Array,
  stress: Float64Array,
  turns: TurningPoints,
): { loops: LoopModulus[]; rejected: RejectedLoop[] } {
  const loops: LoopModulus[] = [];
  const rejected: RejectedLoop[] = [];
  for (let k = 0; k < turns.valleys.length; k++) {
    const p = turns.peaks[k];
    const v = turns.valleys[k];
    const sigMax = stress[p];
    const sigValley = stress[v];
    if (!(sigMax > 0) || sigMax - sigValley < 0.3 * sigMax) {
      rejected.push({ peakIndex: p, reason: "unloading amplitude below 0.3·σmax" });
      continue;
    }
    const partial = sigValley > 0.2 * sigMax;
    const [lo, hi] = fitWindow(sigMax, sigValley, partial);
    const inWindow = (i: number) => stress[i] >= lo && stress[i] <= hi;
    const unload = leastSquaresLine(strain, stress, p, v, inWindow);
    if (unload.n < 5) {
      rejected.push({ peakIndex: p, reason: "fewer than 5 points in the fit window" });
      continue;
    }
    const E = unload.slope;
    // Spec E.3: the measured strain when the valley reaches zero stress, else the intercept.
    const epsR = Math.abs(sigValley) < 0.02 * sigMax ? strain[v] : -unload.intercept / E;
    const reloadEnd = k + 1 < turns.peaks.length ? turns.peaks[k + 1] : -1;
    let reloadE: number | null = null;
    if (reloadEnd > v) {
      // Reloading is elastic below the previous peak, so the same window applies.
      const reload = leastSquaresLine(
        strain,
        stress,
        v,
        reloadEnd,
        (i) => inWindow(i) && stress[i] < sigMax,
      );
      if (reload.n >= 5) reloadE = reload.slope;
    }
    const hysteresis = reloadE !== null && Math.abs(reloadE - E) > 0.1 * Math.abs(E);
    const chordE = hysteresis ? (sigMax - sigValley) / (strain[p] - strain[v]) : null;
    loops.push({
      peakIndex: p,
      valleyIndex: v,
      epsMax: strain[p],
      sigMax,
      sigValley,
      partial,
      E,
      epsR,
      r2: unload.r2,
      seE: unload.seSlope,
      reloadE,
      chordE,
      hysteresis,
    });
  }
  return { loops, rejected };
}

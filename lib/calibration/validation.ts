/**
 * Spec E.11: unilateral check on compression after tensile damage, and validation by replaying
 * the measured strain history with the identified parameters: RMS stress error, peak error and
 * the error of every loop's unloading modulus.
 */
import type { TestType } from "@/lib/csv/record-schema";
import type { MaterialParams } from "@/lib/mechanics/types";
import type { CleanRecord } from "./clean";
import { leastSquaresLine } from "./line-fit";
import { measureLoops } from "./loop-moduli";
import { replayRecord } from "./replay";
import { median } from "./robust-stats";
import { findTurningPoints } from "./turning-points";
import type { LoopRow } from "./types";

/** Median slope of the compressive stretches (σ < −0.1·σmax) after the first damaged loop. */
export function compressionModulus(clean: CleanRecord, loops: LoopRow[]): number | null {
  const firstDamaged = loops.find((l) => l.d > 0.01);
  if (!firstDamaged) return null;
  let sigMax = 0;
  for (const s of clean.stress) sigMax = Math.max(sigMax, s);
  const slopes: number[] = [];
  let runStart = -1;
  for (let i = firstDamaged.peakIndex; i <= clean.stress.length; i++) {
    const inside = i < clean.stress.length && clean.stress[i] < -0.1 * sigMax;
    if (inside && runStart < 0) runStart = i;
    if (!inside && runStart >= 0) {
      if (i - runStart >= 5)
        slopes.push(leastSquaresLine(clean.strain, clean.stress, runStart, i - 1).slope);
      runStart = -1;
    }
  }
  return slopes.length ? median(slopes) : null;
}

export interface ReplayValidation {
  rms: number; // MPa
  peakError: number; // MPa, model peak stress minus measured peak stress
  loopModulusError: number[]; // relative, per loop of the record's table
  failed: boolean;
}

export function validateByReplay(
  params: MaterialParams,
  testType: TestType,
  clean: CleanRecord,
): ReplayValidation {
  const { predicted, status } = replayRecord(params, testType, clean);
  const n = clean.stress.length;
  let sse = 0;
  let peakModel = -Infinity;
  let peakMeasured = -Infinity;
  for (let i = 0; i < n; i++) {
    sse += (predicted[i] - clean.stress[i]) ** 2;
    peakModel = Math.max(peakModel, predicted[i]);
    peakMeasured = Math.max(peakMeasured, clean.stress[i]);
  }
  // Same loops, same windows, on both curves: the modulus error is like for like.
  const turns = findTurningPoints(clean.strain, clean.noiseStrain);
  const measured = measureLoops(clean.strain, clean.stress, turns).loops;
  const model = measureLoops(clean.strain, predicted, turns).loops;
  const byPeak = new Map(model.map((l) => [l.peakIndex, l.E]));
  const loopModulusError = measured.map((l) => {
    const e = byPeak.get(l.peakIndex);
    return e === undefined ? Number.NaN : (e - l.E) / l.E;
  });
  return {
    rms: Math.sqrt(sse / Math.max(1, n)),
    peakError: peakModel - peakMeasured,
    loopModulusError,
    failed: status.failed,
  };
}

/**
 * Spec E.1: keep the row order, drop rows with a non-finite value, estimate the noise of strain
 * and stress. Units were settled when the file was read (lib/csv), so nothing is rescaled here.
 */
import { noiseOfSignal } from "./robust-stats";
import type { RecordPoints } from "./types";

export interface CleanRecord extends RecordPoints {
  dropped: number; // rows removed for a non-finite value
  noiseStrain: number; // mm/mm, one standard deviation
  noiseStress: number; // MPa
}

export function cleanRecord(points: RecordPoints): CleanRecord {
  const { strain, stress, transverseStrain } = points;
  const keep: number[] = [];
  for (let i = 0; i < strain.length; i++) {
    const finite =
      Number.isFinite(strain[i]) &&
      Number.isFinite(stress[i]) &&
      (transverseStrain === undefined || Number.isFinite(transverseStrain[i]));
    if (finite) keep.push(i);
  }
  const pick = (a: Float64Array) => Float64Array.from(keep, (i) => a[i]);
  const cleanStrain = keep.length === strain.length ? strain : pick(strain);
  const cleanStress = keep.length === stress.length ? stress : pick(stress);
  return {
    strain: cleanStrain,
    stress: cleanStress,
    transverseStrain:
      transverseStrain &&
      (keep.length === strain.length ? transverseStrain : pick(transverseStrain)),
    dropped: strain.length - keep.length,
    noiseStrain: noiseOfSignal(cleanStrain),
    noiseStress: noiseOfSignal(cleanStress),
  };
}

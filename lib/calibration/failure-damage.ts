/**
 * Spec E.10: dcrit from a record. A record that ends loaded near its largest strain ended in
 * rupture: d at the rupture stress by the law (stress-control inversion of D.4, equal to
 * a·(sqrt(Y_f) − sqrt(Y0))). Otherwise the damage of the last complete loop, a lower bound.
 */
import { damageAtPeak } from "./golden-section";
import type { CleanRecord } from "./clean";
import type { LoopRow } from "./types";

export interface FailureDamage {
  dcrit: number;
  source: "rupture" | "last loop";
}

export function failureDamage(
  clean: CleanRecord,
  loops: LoopRow[],
  E0: number,
  a: number,
  Y0: number,
): FailureDamage | null {
  const n = clean.stress.length;
  let maxStress = 0;
  let maxStrain = -Infinity;
  for (let i = 0; i < n; i++) {
    maxStress = Math.max(maxStress, clean.stress[i]);
    maxStrain = Math.max(maxStrain, clean.strain[i]);
  }
  const last = n - 1;
  const ruptured =
    n > 0 && clean.stress[last] > 0.5 * maxStress && clean.strain[last] >= 0.98 * maxStrain;
  if (ruptured) {
    const d = damageAtPeak(clean.stress[last] / Math.sqrt(2 * E0), a, Y0);
    if (d > 0) return { dcrit: d, source: "rupture" };
  }
  if (loops.length === 0) return null;
  return { dcrit: loops[loops.length - 1].d, source: "last loop" };
}

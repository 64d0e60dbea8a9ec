/**
 * Spec E.1–E.6 on one uniaxial cyclic record (tension along 1 or 2): cleaning, loops, moduli,
 * damage and force per loop, threshold and slope, frozen-strain coefficient.
 */
import type { DamageLaw } from "@/lib/mechanics/types";
import { cleanRecord, type CleanRecord } from "./clean";
import { fitFrozenStrain, type FrozenStrainFit } from "./frozen-strain";
import { initialModulus, type InitialModulus } from "./initial-modulus";
import { measureLoops, type RejectedLoop } from "./loop-moduli";
import { median } from "./robust-stats";
import { fitThreshold, loopForce, type ThresholdFit } from "./threshold-fit";
import { findTurningPoints } from "./turning-points";
import type { LoopRow, TestRecordInput, Warning } from "./types";

export interface AxisIdentification {
  clean: CleanRecord;
  loops: LoopRow[];
  rejected: RejectedLoop[];
  E0: InitialModulus | null;
  dmin: number;
  threshold: ThresholdFit | null;
  frozen: FrozenStrainFit | null;
  warnings: Warning[];
}

/**
 * `modulus`: with hysteresis (unloading and reloading slopes differ by more than 10 %) the user
 * may take the valley→peak chord instead of the unloading fit (spec E.3; default unloading).
 */
export function identifyAxis(
  record: TestRecordInput,
  law: DamageLaw = "sqrtY",
  modulus: "unloading" | "chord" = "unloading",
): AxisIdentification {
  const clean = cleanRecord(record.points);
  const warnings: Warning[] = [];
  const byStress = record.control === "stress";
  const control = byStress ? clean.stress : clean.strain;
  const turns = findTurningPoints(control, byStress ? clean.noiseStress : clean.noiseStrain);
  const found = measureLoops(clean.strain, clean.stress, turns);
  const rejected = found.rejected;
  const measured =
    modulus === "chord"
      ? found.loops.map((l) => (l.chordE === null ? l : { ...l, E: l.chordE }))
      : found.loops;
  const E0 = initialModulus(clean.strain, clean.stress, measured);
  if (E0 === null) {
    warnings.push("insufficient loops");
    return { clean, loops: [], rejected, E0, dmin: 0, threshold: null, frozen: null, warnings };
  }
  // Noise of d from the scatter of the unloading fits: dmin = max(0.01, 3·noise of d) (E.5).
  const noiseD = measured.length > 0 ? median(measured.map((l) => l.seE)) / E0.E0 : 0;
  const dmin = Math.max(0.01, 3 * noiseD);
  const loops: LoopRow[] = measured.map((l, i) => {
    const force = loopForce(l.E, l.sigMax, E0.E0);
    return { ...l, k: i + 1, d: force.d, Y: force.Y, usedInFit: force.d >= dmin };
  });
  if (loops.some((l) => l.hysteresis)) warnings.push("hysteresis");
  const used = loops.filter((l) => l.usedInFit);
  const outcome = fitThreshold(used, law);
  if (!outcome.ok) warnings.push(outcome.reason);
  const threshold = outcome.ok ? outcome.fit : null;
  if (threshold && !threshold.envelopeOk) {
    warnings.push(
      law === "sqrtY"
        ? "envelope check failed: a·sqrt(Y0) must be below 1"
        : "envelope check failed: 2·a·Y0 must be below 1",
    );
  }
  const frozen = fitFrozenStrain(
    used.map((l) => l.d),
    used.map((l) => l.epsR),
    clean.noiseStrain,
  );
  if (frozen?.interceptClearlyPositive) {
    warnings.push("clearly positive intercept: creep/viscoelastic residual strain not modelled");
  }
  return { clean, loops, rejected, E0, dmin, threshold, frozen, warnings };
}

/** Spec E.7: nu12 from the initial slope of −ε_transverse against ε_axial on the first ramp. */
export function poissonFromRamp(clean: CleanRecord, firstPeak: number): number | null {
  const t = clean.transverseStrain;
  if (!t) return null;
  const sigMax = clean.stress[firstPeak];
  let sxy = 0;
  let sxx = 0;
  let n = 0;
  for (let i = 0; i <= firstPeak; i++) {
    if (clean.stress[i] > 0.05 * sigMax && clean.stress[i] < 0.35 * sigMax) {
      sxy += clean.strain[i] * -t[i];
      sxx += clean.strain[i] * clean.strain[i];
      n++;
    }
  }
  return n >= 5 ? sxy / sxx : null;
}

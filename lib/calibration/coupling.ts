/**
 * Spec E.8: the coupling b between the two crack families.
 * (a) transverse modulus after axial pre-damage, closed form per specimen;
 * (b) equibiaxial loops against D.10's closed form, golden-section on [0, 1];
 * (c) off-axis tension replayed through the driver, golden-section on [0, 1].
 */
import type { MaterialParams } from "@/lib/mechanics/types";
import { damageAtPeak, goldenSection } from "./golden-section";
import type { LoopModulus } from "./loop-moduli";
import { replayError } from "./replay";
import type { RecordPoints } from "./types";

export interface CouplingFromTransverse {
  b: number | null; // least squares over specimens with d2 > dmin, clipped to [0, 1]
  upperBound: number | null; // from specimens without measurable d2: b ≤ Y0_2/Y1max
}

/** (a) Each specimen: d2 = 1 − E2dam/E2; b = (sqrt(Y0_2) + d2/a2)²/Y1max. */
export function couplingFromTransverse(
  specimens: { E2dam: number; Y1max: number }[],
  p: Pick<MaterialParams, "E2" | "Y0_2" | "a2">,
  dmin: number,
): CouplingFromTransverse {
  const estimates: number[] = [];
  let upper: number | null = null;
  for (const s of specimens) {
    const d2 = 1 - s.E2dam / p.E2;
    if (d2 > dmin) estimates.push((Math.sqrt(p.Y0_2) + d2 / p.a2) ** 2 / s.Y1max);
    else upper = Math.min(upper ?? Infinity, p.Y0_2 / s.Y1max);
  }
  // The least-squares estimate of one constant from several values is their mean.
  const mean = estimates.length ? estimates.reduce((x, y) => x + y, 0) / estimates.length : null;
  return { b: mean === null ? null : Math.min(1, Math.max(0, mean)), upperBound: upper };
}

/** (b) Apparent unloading modulus σ11/ε11 of an equibiaxial loop: E/(1/(1 − d) − nu) (D.10). */
export function couplingFromEquibiaxial(loops: LoopModulus[], p: MaterialParams): number {
  const E = p.E1;
  const error = (b: number) =>
    loops.reduce((sum, loop) => {
      const d = damageAtPeak((loop.sigMax * Math.sqrt(1 + b)) / Math.sqrt(2 * E), p.a1, p.Y0_1);
      const model = E / (1 / (1 - d) - p.nu12);
      return sum + ((loop.E - model) / E) ** 2;
    }, 0);
  return goldenSection(error, 0, 1);
}

/** (c) Off-axis tension, fixed frame: the load axis at `orientation` degrees from axis 1. */
export function couplingFromOffAxis(
  points: RecordPoints,
  orientation: number,
  p: MaterialParams,
): number {
  const error = (b: number) =>
    replayError({ ...p, b, frame: "fixed", thetaD: -orientation }, "tension-1", points);
  return goldenSection(error, 0, 1, 1e-4);
}

/**
 * Spec E.3: the undamaged modulus E0. Preferred: the median unloading modulus of the leading
 * loops that agree within 2 % and whose peaks are below the knee (loading to them was elastic).
 * When loop 1 is already damaged its modulus sits clearly below the first ramp's, and the ramp
 * fit (0.05–0.35·σmax_1) is used instead.
 */
import { leastSquaresLine } from "./line-fit";
import type { LoopModulus } from "./loop-moduli";
import { median } from "./robust-stats";

export interface InitialModulus {
  E0: number; // MPa
  source: "sub-knee loops" | "first ramp";
  loopsUsed: number;
  rampE: number | null;
}

function firstRamp(strain: Float64Array, stress: Float64Array, end: number, sigMax1: number) {
  const fit = leastSquaresLine(
    strain,
    stress,
    0,
    end,
    (i) => stress[i] > 0.05 * sigMax1 && stress[i] < 0.35 * sigMax1,
  );
  return fit.n >= 5 ? fit : null;
}

export function initialModulus(
  strain: Float64Array,
  stress: Float64Array,
  loops: LoopModulus[],
): InitialModulus | null {
  if (loops.length === 0) {
    let peak = 0;
    for (let i = 1; i < stress.length; i++) if (stress[i] > stress[peak]) peak = i;
    const ramp = firstRamp(strain, stress, peak, stress[peak]);
    return ramp ? { E0: ramp.slope, source: "first ramp", loopsUsed: 0, rampE: ramp.slope } : null;
  }
  const ramp = firstRamp(strain, stress, loops[0].peakIndex, loops[0].sigMax);
  // A loop's peak is below the knee when loading to it was elastic: the secant from the loop's
  // start (origin or previous valley) to its peak equals its unloading modulus (within 1 %).
  const group: number[] = [];
  for (let k = 0; k < loops.length; k++) {
    const loop = loops[k];
    if (k > 0 && Math.abs(loop.E - loops[0].E) > 0.02 * loops[0].E) break;
    const start = k === 0 ? 0 : loops[k - 1].valleyIndex;
    const secant = (loop.sigMax - stress[start]) / (loop.epsMax - strain[start]);
    if (Math.abs(secant / loop.E - 1) > Math.max(0.01, (3 * loop.seE) / loop.E)) break;
    group.push(loop.E);
  }
  if (group.length === 0) {
    return ramp ? { E0: ramp.slope, source: "first ramp", loopsUsed: 0, rampE: ramp.slope } : null;
  }
  const fromLoops = median(group);
  if (ramp) {
    // Loop 1 is damaged when its modulus lies below the ramp by more than 2 % and by more than
    // three standard errors of the ramp slope (noise must not decide).
    const gap = ramp.slope - loops[0].E;
    if (gap > Math.max(0.02 * ramp.slope, 3 * ramp.seSlope)) {
      return { E0: ramp.slope, source: "first ramp", loopsUsed: 0, rampE: ramp.slope };
    }
  }
  return {
    E0: fromLoops,
    source: "sub-knee loops",
    loopsUsed: group.length,
    rampE: ramp?.slope ?? null,
  };
}

/**
 * Spec E.3: the undamaged modulus E0. Preferred: the median unloading modulus of the leading
 * loops that agree within 2 % (peaks below the knee). Those loops are only sub-knee if they agree
 * with the first loading ramp too; when loop 1 is already damaged its modulus sits clearly below
 * the ramp's and the ramp fit (0.05–0.35·σmax_1) is used instead.
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
  const group = [loops[0].E];
  for (let k = 1; k < loops.length && Math.abs(loops[k].E - loops[0].E) <= 0.02 * loops[0].E; k++) {
    group.push(loops[k].E);
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

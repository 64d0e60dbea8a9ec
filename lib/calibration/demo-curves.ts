/**
 * INVENTED demonstration data: cyclic tension curves along axis 1 generated from the invented
 * demo parameter set of spec A.3 plus seeded uniform noise. They are not measurements of any
 * material and must be labelled as invented wherever they are shown.
 *
 * The curve is the law's exact uniaxial response (spec D.4 envelope, D.5 linear unloading to the
 * permanent strain alpha·d, D.8 memory): loading legs in strain control, unloading legs in stress
 * control to σ = 0, the same targets the driver would be given, so the driver reproduces it.
 */
import { DEMO_SMC } from "@/lib/mechanics/demo-set";
import type { MaterialParams } from "@/lib/mechanics/types";
import type { RecordPoints } from "./types";

/** Spec A.3 demo SMC set [I]: invented values. */
export const DEMO_PARAMS: MaterialParams = DEMO_SMC;

export interface DemoCurveOptions {
  peaks?: number[]; // strain peaks, default 0.002, 0.004, … 0.014 (spec D.18)
  increments?: number; // per leg, default 60
  noiseStress?: number; // MPa, half-width of uniform noise
  noiseStrain?: number; // mm/mm, half-width of uniform noise
  seed?: number;
}

export const D18_PEAKS = [0.002, 0.004, 0.006, 0.008, 0.01, 0.012, 0.014];

/** Small deterministic generator (mulberry32): the same seed gives the same file everywhere. */
export function seededUniform(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Cyclic uniaxial tension along 1 ('sqrtY' law, axis-1 parameters of `p`). */
export function demoCyclicTension(
  p: MaterialParams = DEMO_PARAMS,
  options: DemoCurveOptions = {},
): RecordPoints {
  const {
    peaks = D18_PEAKS,
    increments = 60,
    noiseStress = 0,
    noiseStrain = 0,
    seed = 1,
  } = options;
  const E = p.E1;
  const eps0 = Math.sqrt((2 * p.Y0_1) / E);
  const compliance = Math.sqrt(2 / E) / p.a1 + p.alpha; // dε/dd on the envelope (D.4)
  const strain: number[] = [0];
  const stress: number[] = [0];
  let d = 0;
  for (const peak of peaks) {
    const start = strain[strain.length - 1];
    for (let k = 1; k <= increments; k++) {
      const eps = start + ((peak - start) * k) / increments;
      d = Math.max(d, Math.min(p.dmax, (eps - eps0) / compliance));
      strain.push(eps);
      stress.push(E * (1 - d) * (eps - p.alpha * d));
    }
    const sigMax = stress[stress.length - 1];
    for (let k = 1; k <= increments; k++) {
      const sig = sigMax * (1 - k / increments);
      strain.push(sig / (E * (1 - d)) + p.alpha * d);
      stress.push(sig);
    }
  }
  const random = seededUniform(seed);
  const noisy = (values: number[], half: number) =>
    Float64Array.from(values, (v) => (half > 0 ? v + half * (2 * random() - 1) : v));
  const transverse = stress.map((s) => (-p.nu12 * s) / p.E1); // D.4: e22 = −nu12·σ/E1
  return {
    strain: noisy(strain, noiseStrain),
    stress: noisy(stress, noiseStress),
    transverseStrain: noisy(transverse, noiseStrain),
  };
}

/**
 * fast-check generators for the property tests: admissible parameter sets (built so the
 * scenario schema accepts them, and checked against it) and random mixed-control paths scaled
 * to each set's threshold strain and stress.
 */
import fc from "fast-check";
import type { ControlKind, Leg, MaterialParams } from "@/lib/mechanics/types";
import { parameterSetSchema, toMaterialParams } from "@/lib/scenario/parameter-set-schema";

/** Spec A.3 demo SMC set [I]. */
export const DEMO: MaterialParams = toMaterialParams({
  id: "A",
  ...parameterSetSchema.parse({
    E1: 11000,
    E2: 11000,
    nu12: 0.3,
    G12: 4230.769,
    Y0_1: 0.05,
    Y0_2: 0.05,
    a1: 0.6,
    a2: 0.6,
    b: 0.3,
    alpha: 0.005,
    beta: 0.005,
    dcrit: 0.45,
  }),
});

const real = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

export interface ParamsOptions {
  /** Damage-frame angle: 0 only, or any in [-90, 90] degrees. */
  rotated?: boolean;
  /** Allow onFailure "continue" (damage capped at dmax on reaching dcrit). */
  allowContinue?: boolean;
}

/**
 * Orthotropic short-fibre-like sets across the admissible ranges of A.3: moduli 3–40 GPa,
 * transverse ratio 0.3–1.5, slopes a_i as a fraction 0.2–0.9 of the envelope bound
 * (a·sqrt(Y0) < 1 for sqrtY, 2·a·Y0 < 1 for linY), b and k6 over their full ranges.
 */
export function admissibleParams(options: ParamsOptions = {}): fc.Arbitrary<MaterialParams> {
  const record = fc.record({
    E1: real(3000, 40000),
    ratio: real(0.3, 1.5),
    nu12: real(0.05, 0.45),
    shear: real(0.2, 0.6),
    Y0_1: real(0.01, 0.1),
    Y0_2: real(0.01, 0.1),
    f1: real(0.2, 0.9),
    f2: real(0.2, 0.9),
    b: real(0, 1),
    k6: real(0, 3),
    alpha: real(0, 0.02),
    beta: real(0, 0.02),
    dcrit: real(0.5, 0.95),
    law: fc.constantFrom("sqrtY" as const, "linY" as const),
    thetaD: options.rotated ? real(-90, 90) : fc.constant(0),
    onFailure: options.allowContinue
      ? fc.constantFrom("stop" as const, "continue" as const)
      : fc.constant("stop" as const),
  });
  return record.map((r) => {
    const E2 = r.E1 * r.ratio;
    const slope = (f: number, y0: number) => (r.law === "sqrtY" ? f / Math.sqrt(y0) : f / (2 * y0));
    const candidate = {
      E1: r.E1,
      E2,
      nu12: r.nu12,
      G12: r.shear * Math.min(r.E1, E2),
      Y0_1: r.Y0_1,
      Y0_2: r.Y0_2,
      a1: slope(r.f1, r.Y0_1),
      a2: slope(r.f2, r.Y0_2),
      b: r.b,
      k6: r.k6,
      alpha: r.alpha,
      beta: r.beta,
      dcrit: r.dcrit,
      law: r.law,
      thetaD: r.thetaD,
      onFailure: r.onFailure,
    };
    // The generator must only produce what a user could load: the schema is the judge.
    return toMaterialParams({ id: "P", ...parameterSetSchema.parse(candidate) });
  });
}

/** In-plane isotropic sets (SMC-like) with the damage frame locked at onset (spec B.8). */
export function onsetParams(): fc.Arbitrary<MaterialParams> {
  return admissibleParams({ allowContinue: true }).map((p) => {
    const set = { ...p, E2: p.E1, G12: p.E1 / (2 * (1 + p.nu12)), frame: "onset" as const };
    return toMaterialParams({ id: "P", ...parameterSetSchema.parse(set) });
  });
}

/** Threshold strain and stress of the weaker family: the scale of a path for this set. */
export function thresholdScale(p: MaterialParams): { strain: number; stress: number } {
  const E = Math.min(p.E1, p.E2);
  const stress = Math.sqrt(2 * E * Math.min(p.Y0_1, p.Y0_2));
  return { strain: stress / E, stress };
}

export interface PathOptions {
  legs: [number, number];
  increments: [number, number];
  /** Allowed control kinds; "strain" only gives all-strain paths. */
  controls?: readonly ControlKind[];
  /** Strain targets up to this many threshold strains. */
  strainReach?: number;
  /** Stress targets up to this fraction of the threshold stress (keeps clear of limit load). */
  stressReach?: number;
}

/** Random legs: per component strain or stress control, targets scaled to the set. */
export function mixedPath(p: MaterialParams, options: PathOptions): fc.Arbitrary<Leg[]> {
  const { strain, stress } = thresholdScale(p);
  const strainReach = options.strainReach ?? 4;
  const stressReach = options.stressReach ?? 0.6;
  const controls = options.controls ?? (["strain", "stress"] as const);
  // Targets on a grid of 1/1000 (fast-check's doubles crowd near 0 and the bounds); tension
  // weighted 2:1 over compression so damage grows on most paths.
  const component = fc.record({
    control: fc.constantFrom(...controls),
    unit: fc.integer({ min: -500, max: 1000 }).map((k) => k / 1000),
  });
  const leg = fc.record({
    parts: fc.tuple(component, component, component),
    increments: fc.integer({ min: options.increments[0], max: options.increments[1] }),
  });
  return fc.array(leg, { minLength: options.legs[0], maxLength: options.legs[1] }).map((legs) =>
    legs.map(({ parts, increments }) => ({
      control: parts.map((c) => c.control) as Leg["control"],
      target: parts.map((c) =>
        c.control === "strain" ? c.unit * strainReach * strain : c.unit * stressReach * stress,
      ) as Leg["target"],
      increments,
    })),
  );
}

/** A set and a path for it, generated together so the path is scaled to the set. */
export function paramsAndPath(params: ParamsOptions, path: PathOptions) {
  return admissibleParams(params).chain((p) =>
    mixedPath(p, path).map((legs) => ({ params: p, legs })),
  );
}

/** Shared fixtures for the spec section D tests (spec damage-law.md A.3 demo set). */
import { runPath, type PathResult } from "@/lib/mechanics/driver";
import type { ControlKind, Leg, MaterialParams } from "@/lib/mechanics/types";
import { expect } from "vitest";

/** Demo SMC set, spec A.3 ([I] invented values). */
export const DEMO: MaterialParams = {
  E1: 11000,
  E2: 11000,
  nu12: 0.3,
  G12: 4230.769,
  Y0_1: 0.05,
  Y0_2: 0.05,
  a1: 0.6,
  a2: 0.6,
  b: 0.3,
  k6: 1,
  alpha: 0.005,
  beta: 0.005,
  dcrit: 0.45,
  dmax: 0.99,
  law: "sqrtY",
  frame: "fixed",
  thetaD: 0,
  Xc: null,
  onFailure: "stop",
};

/** Spec D.14 "set A": one definition, in test/fixtures (the core bench reads it too). */
export { SET_A } from "../../fixtures/set-a";

export const S: ControlKind = "stress";
export const E: ControlKind = "strain";

export function leg(
  control: [ControlKind, ControlKind, ControlKind],
  target: [number, number, number],
  increments: number,
): Leg {
  return { control, target, increments };
}

export function run(params: Partial<MaterialParams>, legs: Leg[]): PathResult {
  return runPath({ ...DEMO, ...params }, legs);
}

/** Last row index of a result. */
export const last = (r: PathResult) => r.rows - 1;

/** |actual − expected| ≤ rel·|expected| (+ abs floor for values that are zero). */
export function expectRel(actual: number, expected: number, rel: number, abs = 1e-300) {
  const tol = Math.max(rel * Math.abs(expected), abs);
  if (!(Math.abs(actual - expected) <= tol)) {
    expect.fail(`expected ${actual} to equal ${expected} within ${tol}`);
  }
}

/** Uniaxial closed forms of spec D.4 (sqrtY law, loading along axis 1). */
export function uniaxial(p: MaterialParams = DEMO) {
  const E1 = p.E1;
  const a = p.a1;
  const sY0 = Math.sqrt(p.Y0_1);
  const k = Math.sqrt(2 / E1) / a + p.alpha;
  const eps0 = Math.sqrt(2 / E1) * sY0;
  const dOfEps = (eps: number) => Math.max(0, (eps - eps0) / k);
  const sigOfEps = (eps: number) => {
    const d = dOfEps(eps);
    return E1 * (1 - d) * (eps - p.alpha * d);
  };
  const sigOfD = (d: number) => (1 - d) * Math.sqrt(2 * E1) * (sY0 + d / a);
  const epsOfD = (d: number) => Math.sqrt(2 / E1) * (sY0 + d / a) + p.alpha * d;
  const dOfSig = (sig: number) => {
    const c = 1 - a * sY0;
    return (c - Math.sqrt(c * c - 4 * a * (sig / Math.sqrt(2 * E1) - sY0))) / 2;
  };
  const dPeak = (1 - a * sY0) / 2;
  const sigMax = Math.sqrt(2 * E1) * (sY0 + (1 - a * sY0) ** 2 / (4 * a));
  /** d2 = F2(b·Y1) with Y1 from d1 (s12 = s22 = 0) */
  const d2OfD1 = (d1: number) => {
    const sY1 = sY0 + d1 / a;
    return Math.max(0, p.a2 * (Math.sqrt(p.b * sY1 * sY1) - Math.sqrt(p.Y0_2)));
  };
  return {
    k,
    eps0,
    sig0: Math.sqrt(2 * E1 * p.Y0_1),
    dOfEps,
    sigOfEps,
    sigOfD,
    epsOfD,
    dOfSig,
    dPeak,
    sigMax,
    d2OfD1,
  };
}

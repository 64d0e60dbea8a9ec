/**
 * Reference formulas of spec C.3 built with ml-matrix full matrices (tests only), used by
 * cross-check.test.ts to check the hand-written kernels independently.
 */
import { Matrix, solve } from "ml-matrix";
import type { MaterialParams } from "@/lib/mechanics/types";
import { SET_A } from "./helpers";

/** Spec D.14 set A (defined once in helpers.ts). */
export const P: MaterialParams = SET_A;

export function mulberry32(seed: number) {
  let t = seed >>> 0;
  return () => {
    t = (t + 0x6d2b79f5) >>> 0;
    let x = Math.imul(t ^ (t >>> 15), 1 | t);
    x = (x + Math.imul(x ^ (x >>> 7), 61 | x)) ^ x;
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

/** Tm of spec B.8 */
export function tmOf(th: number) {
  const c = Math.cos(th);
  const s = Math.sin(th);
  return new Matrix([
    [c * c, s * s, 2 * s * c],
    [s * s, c * c, -2 * s * c],
    [-s * c, s * c, c * c - s * s],
  ]);
}

/** S_D of spec C.3 for regime (o1, o2) */
export function sdOf(d1: number, d2: number, o1: number, o2: number) {
  const w1 = d1 / (1 - d1);
  const w2 = d2 / (1 - d2);
  return new Matrix([
    [(1 + o1 * w1) / P.E1, -P.nu12 / P.E1, 0],
    [-P.nu12 / P.E1, (1 + o2 * w2) / P.E2, 0],
    [0, 0, 1 / P.G12 + P.k6 * (w1 / P.E1 + w2 / P.E2)],
  ]);
}

/** Independent elastic solve: the 6×6 system in (sig, eps) for one regime. */
export function elasticRef(
  d1: number,
  d2: number,
  dp1: number,
  dp2: number,
  th: number,
  reg: number,
  ctrl: number,
  tgt: number[],
) {
  const Tm = tmOf(th);
  const SL = Tm.transpose()
    .mmul(sdOf(d1, d2, reg & 1, (reg >> 1) & 1))
    .mmul(Tm);
  const ePL = Tm.transpose().mmul(Matrix.columnVector([P.alpha * dp1, P.beta * dp2, 0]));
  const A = Matrix.zeros(6, 6);
  const rhs = Matrix.zeros(6, 1);
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) A.set(i, j, -SL.get(i, j));
    A.set(i, 3 + i, 1);
    rhs.set(i, 0, ePL.get(i, 0));
    A.set(3 + i, ctrl & (1 << i) ? 3 + i : i, 1);
    rhs.set(3 + i, 0, tgt[i]);
  }
  const x = solve(A, rhs).to1DArray();
  const sig = x.slice(0, 3);
  const sigD = Tm.mmul(Matrix.columnVector(sig)).to1DArray();
  return { sig, eps: x.slice(3), sigD, SL, Tm, ePL };
}

export function consistent(reg: number, sigD: number[]) {
  const tol = 1e-9 * Math.max(1, ...sigD.map(Math.abs));
  return [0, 1].every((i) => ((reg >> i) & 1 ? sigD[i] >= -tol : sigD[i] <= tol));
}

export function randomCase(rnd: () => number) {
  const d1 = 0.7 * rnd();
  const d2 = 0.7 * rnd();
  return {
    d1,
    d2,
    dp1: d1 * rnd(),
    dp2: d2 * rnd(),
    th: (rnd() - 0.5) * Math.PI,
    ctrl: Math.floor(rnd() * 8),
    tgt: [0, 1, 2].map(() => (rnd() - 0.5) * 0.02),
    stressTgt: [0, 1, 2].map(() => (rnd() - 0.5) * 100),
  };
}

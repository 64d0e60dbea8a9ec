/**
 * Material constants compiled once per run from a validated parameter set, so the hot loop
 * reads plain numbers (no string compares, no divisions that can be hoisted).
 */
import type { MaterialParams } from "./types";

export const DEG = Math.PI / 180;

export interface Material {
  E1: number;
  E2: number;
  invE1: number;
  invE2: number;
  invG12: number;
  /** S0[0][1] = -nu12/E1 (the undamaged, never switched Poisson term, spec B.3) */
  s12: number;
  sqrtY01: number;
  sqrtY02: number;
  Y01: number;
  Y02: number;
  a1: number;
  a2: number;
  b: number;
  k6: number;
  alpha: number;
  beta: number;
  dcrit: number;
  dmax: number;
  /** true for law 'linY', false for 'sqrtY' */
  linY: boolean;
  onsetFrame: boolean;
  thetaDeg: number;
  thetaRad: number;
  /** compressive strength flag, NaN when off */
  Xc: number;
  continueOnFailure: boolean;
}

export function compileMaterial(p: MaterialParams): Material {
  return {
    E1: p.E1,
    E2: p.E2,
    invE1: 1 / p.E1,
    invE2: 1 / p.E2,
    invG12: 1 / p.G12,
    s12: -p.nu12 / p.E1,
    sqrtY01: Math.sqrt(p.Y0_1),
    sqrtY02: Math.sqrt(p.Y0_2),
    Y01: p.Y0_1,
    Y02: p.Y0_2,
    a1: p.a1,
    a2: p.a2,
    b: p.b,
    k6: p.k6,
    alpha: p.alpha,
    beta: p.beta,
    dcrit: p.dcrit,
    dmax: p.dmax,
    linY: p.law === "linY",
    onsetFrame: p.frame === "onset",
    thetaDeg: p.thetaD,
    thetaRad: p.thetaD * DEG,
    Xc: p.Xc === null || p.Xc === undefined ? NaN : p.Xc,
    continueOnFailure: p.onFailure === "continue",
  };
}

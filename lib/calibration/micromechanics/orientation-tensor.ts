/**
 * The planar second-order orientation tensor of a layer and what follows from it (spec A.5;
 * Advani & Tucker 1987): principal direction, principal value and order parameter.
 * `a = [[a11, a12], [a12, a22]]`, `a22 = 1 − a11`; angles in degrees, counter-clockwise from x.
 */

export interface PlanarOrientation {
  a11: number; // in [0, 1]
  a12: number; // |a12| ≤ sqrt(a11·(1 − a11)) for a positive semi-definite tensor
}

export interface OrientationPrincipal {
  thetaA: number; // degrees, the layer's flow direction
  lam: number; // principal value in [1/2, 1]
  s: number; // order parameter 2·lam − 1: 0 planar random, 1 aligned
}

/** thetaA = ½·atan2(2·a12, a11 − a22), lam = ½ + sqrt(¼(a11 − a22)² + a12²), s = 2·lam − 1. */
export function principalOf(a: PlanarOrientation): OrientationPrincipal {
  const diff = 2 * a.a11 - 1; // a11 − a22
  const radius = Math.sqrt(0.25 * diff * diff + a.a12 * a.a12);
  return {
    thetaA: (0.5 * Math.atan2(2 * a.a12, diff) * 180) / Math.PI,
    lam: 0.5 + radius,
    s: 2 * radius,
  };
}

/** The tensor with order parameter s whose principal direction is thetaA (the inverse map). */
export function tensorOf(thetaA: number, s: number): PlanarOrientation {
  const t = (2 * thetaA * Math.PI) / 180;
  return { a11: 0.5 + 0.5 * s * Math.cos(t), a12: 0.5 * s * Math.sin(t) };
}

/** Why a tensor is not a planar orientation state, in the user's words; null when it is one. */
export function orientationProblem(a: PlanarOrientation): string | null {
  if (!Number.isFinite(a.a11) || !Number.isFinite(a.a12)) return "a11 and a12 must be numbers";
  if (a.a11 < 0 || a.a11 > 1) return "a11 must lie between 0 and 1 (a11 + a22 = 1)";
  if (a.a12 * a.a12 > a.a11 * (1 - a.a11) + 1e-12) {
    return "a12² must not exceed a11·a22: no fibre distribution has that tensor";
  }
  return null;
}

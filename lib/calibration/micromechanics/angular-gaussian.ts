/**
 * The planar angular central Gaussian distribution of fibre directions with a given orientation
 * tensor (spec A.5): f(θ) = 1/(2π·sqrt(det Σ)·pᵀΣ⁻¹p) on [0, 2π), p = (cos θ, sin θ). Its second
 * moment has principal value lam when sqrt(σ1/σ2) = lam/(1 − lam) (Tyler 1987 for the family).
 * Used for the polar picture of a layer, and by the tests to check the exact closure c4 = s².
 */
import { principalOf, type PlanarOrientation } from "./orientation-tensor";

/** Density per radian at angle theta (degrees, load frame); an aligned layer returns Infinity on its axis. */
export function fibreDensity(a: PlanarOrientation, theta: number): number {
  const { thetaA, lam } = principalOf(a);
  if (lam >= 1) {
    const off = (((theta - thetaA) % 180) + 180) % 180;
    return off === 0 ? Infinity : 0;
  }
  const r = lam / (1 - lam); // sqrt(σ1/σ2); Σ scaled to σ1 = r, σ2 = 1/r (det 1)
  const psi = ((theta - thetaA) * Math.PI) / 180;
  const c = Math.cos(psi);
  const s = Math.sin(psi);
  return 1 / (2 * Math.PI * ((c * c) / r + s * s * r));
}

/** The density sampled at n equally spaced angles over a full turn (for a polar plot). */
export function fibreDensityCurve(a: PlanarOrientation, n = 181): { theta: number; f: number }[] {
  const out: { theta: number; f: number }[] = [];
  for (let k = 0; k < n; k++) {
    const theta = (360 * k) / (n - 1);
    out.push({ theta, f: fibreDensity(a, theta) });
  }
  return out;
}

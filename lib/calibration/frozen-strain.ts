/**
 * Spec E.6: frozen (permanent) strain per unit open damage, εr_k = alpha·d_k, by least squares
 * through the origin. The free-intercept line is reported too: an intercept clearly above zero
 * means residual strain that does not scale with damage (creep, viscoelastic recovery not yet
 * finished), which the law does not model.
 */
import { leastSquaresLine, throughOriginSlope } from "./line-fit";

export interface FrozenStrainFit {
  alpha: number; // mm/mm
  freeSlope: number;
  freeIntercept: number; // mm/mm
  interceptClearlyPositive: boolean;
}

export function fitFrozenStrain(
  d: number[],
  epsR: number[],
  noiseStrain: number,
): FrozenStrainFit | null {
  if (d.length === 0) return null;
  const alpha = Math.max(0, throughOriginSlope(d, epsR)); // the law requires alpha ≥ 0
  if (d.length < 3)
    return { alpha, freeSlope: alpha, freeIntercept: 0, interceptClearlyPositive: false };
  const free = leastSquaresLine(d, epsR);
  const clearly = free.intercept > Math.max(3 * free.seIntercept, 2 * noiseStrain, 0);
  return {
    alpha,
    freeSlope: free.slope,
    freeIntercept: free.intercept,
    interceptClearlyPositive: clearly,
  };
}

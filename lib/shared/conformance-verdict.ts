// A conformance check as the hand-off panel and the scenarios table read it: the verdict, when,
// on which file, and the quantity that came closest to (or went furthest past) its tolerance.

export interface QuantityDeviation {
  quantity: string;
  maxAbs: number;
  tolerance: number;
}

export interface ConformanceVerdict {
  passed: boolean;
  checkedAt: string;
  fileName: string;
  firstFailIncrement: number | null;
  largest: { quantity: string; maxAbs: number } | null;
}

/**
 * The largest deviation measured against its own tolerance: stresses (MPa) and damages (no
 * unit) have different scales, so the raw largest number would always name a stress.
 */
export function largestDeviation(
  quantities: readonly QuantityDeviation[],
): { quantity: string; maxAbs: number } | null {
  let worst: QuantityDeviation | null = null;
  for (const q of quantities) {
    if (!worst || q.maxAbs / q.tolerance > worst.maxAbs / worst.tolerance) worst = q;
  }
  return worst ? { quantity: worst.quantity, maxAbs: worst.maxAbs } : null;
}

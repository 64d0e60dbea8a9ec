/**
 * Hand-written 3×3 kernels (row-major Float64Array(9)); no allocation, no matrix objects.
 * Cross-checked against ml-matrix in test/unit/mechanics/cross-check.test.ts.
 */

/** out = a⁻¹ (3×3). Returns the determinant; `out` is untouched when it is 0 or not finite. */
export function invert3(a: Float64Array, out: Float64Array): number {
  const c00 = a[4] * a[8] - a[5] * a[7];
  const c01 = a[5] * a[6] - a[3] * a[8];
  const c02 = a[3] * a[7] - a[4] * a[6];
  const det = a[0] * c00 + a[1] * c01 + a[2] * c02;
  if (det === 0 || !Number.isFinite(det)) return det;
  const id = 1 / det;
  out[0] = c00 * id;
  out[1] = (a[2] * a[7] - a[1] * a[8]) * id;
  out[2] = (a[1] * a[5] - a[2] * a[4]) * id;
  out[3] = c01 * id;
  out[4] = (a[0] * a[8] - a[2] * a[6]) * id;
  out[5] = (a[2] * a[3] - a[0] * a[5]) * id;
  out[6] = c02 * id;
  out[7] = (a[1] * a[6] - a[0] * a[7]) * id;
  out[8] = (a[0] * a[4] - a[1] * a[3]) * id;
  return det;
}

/**
 * Inverse of the principal sub-matrix a[P,P] (P = set bits of `mask`, bit k ↔ component k),
 * embedded in a 3×3 matrix that is zero outside P×P. Used for the mixed-control solve
 * sig_P = S_L[P,P]⁻¹·(…) of spec C.3 and its derivative in C.5.
 */
export function invertPrincipal(a: Float64Array, mask: number, out: Float64Array): void {
  if (mask === 7) {
    invert3(a, out);
    return;
  }
  out.fill(0);
  if (mask === 0) return;
  if (mask === 1 || mask === 2 || mask === 4) {
    const p = mask === 1 ? 0 : mask === 2 ? 1 : 2;
    out[4 * p] = 1 / a[4 * p];
    return;
  }
  const p = mask === 6 ? 1 : 0;
  const q = mask === 3 ? 1 : 2;
  const app = a[4 * p];
  const aqq = a[4 * q];
  const apq = a[3 * p + q];
  const aqp = a[3 * q + p];
  const id = 1 / (app * aqq - apq * aqp);
  out[4 * p] = aqq * id;
  out[4 * q] = app * id;
  out[3 * p + q] = -apq * id;
  out[3 * q + p] = -aqp * id;
}

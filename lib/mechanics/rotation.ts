/**
 * Damage-frame rotation of spec B.8 (engineering-shear Voigt, counter-clockwise angle from the
 * load axis x to damage axis 1):
 *   Tm = [[c², s², 2sc], [s², c², −2sc], [−sc, sc, c² − s²]]
 *   sig_D = Tm·sig_L ;  eps_L = Tmᵀ·eps_D ;  S_L = Tmᵀ·S_D·Tm
 * Matrices are row-major Float64Array(9).
 */

/** Writes Tm(theta) (theta in radians) into `out`. */
export function fillRotation(theta: number, out: Float64Array): void {
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  out[0] = c * c;
  out[1] = s * s;
  out[2] = 2 * s * c;
  out[3] = s * s;
  out[4] = c * c;
  out[5] = -2 * s * c;
  out[6] = -s * c;
  out[7] = s * c;
  out[8] = c * c - s * s;
}

/** out = Tm·v (stress to the damage frame). `out` must not alias `v`. */
export function rotateStressToDamage(tm: Float64Array, v: Float64Array, out: Float64Array): void {
  out[0] = tm[0] * v[0] + tm[1] * v[1] + tm[2] * v[2];
  out[1] = tm[3] * v[0] + tm[4] * v[1] + tm[5] * v[2];
  out[2] = tm[6] * v[0] + tm[7] * v[1] + tm[8] * v[2];
}

/** out = Tmᵀ·v (damage-frame strain to the load frame). `out` must not alias `v`. */
export function rotateStrainToLoad(tm: Float64Array, v: Float64Array, out: Float64Array): void {
  out[0] = tm[0] * v[0] + tm[3] * v[1] + tm[6] * v[2];
  out[1] = tm[1] * v[0] + tm[4] * v[1] + tm[7] * v[2];
  out[2] = tm[2] * v[0] + tm[5] * v[1] + tm[8] * v[2];
}

/**
 * S_L = Tmᵀ·S_D·Tm for the damage-frame compliance
 * S_D = [[a11, a12, 0], [a12, a22, 0], [0, 0, a66]] (spec B.3 is orthotropic in the damage frame).
 */
export function rotateCompliance(
  tm: Float64Array,
  a11: number,
  a12: number,
  a22: number,
  a66: number,
  out: Float64Array,
): void {
  // M = S_D·Tm (rows), then S_L[i][j] = Σ_k Tm[k][i]·M[k][j]
  const m00 = a11 * tm[0] + a12 * tm[3];
  const m01 = a11 * tm[1] + a12 * tm[4];
  const m02 = a11 * tm[2] + a12 * tm[5];
  const m10 = a12 * tm[0] + a22 * tm[3];
  const m11 = a12 * tm[1] + a22 * tm[4];
  const m12 = a12 * tm[2] + a22 * tm[5];
  const m20 = a66 * tm[6];
  const m21 = a66 * tm[7];
  const m22 = a66 * tm[8];
  for (let i = 0; i < 3; i++) {
    const t0 = tm[i];
    const t1 = tm[3 + i];
    const t2 = tm[6 + i];
    out[3 * i] = t0 * m00 + t1 * m10 + t2 * m20;
    out[3 * i + 1] = t0 * m01 + t1 * m11 + t2 * m21;
    out[3 * i + 2] = t0 * m02 + t1 * m12 + t2 * m22;
  }
}

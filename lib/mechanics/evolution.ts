/**
 * Damage evolution (spec B.5–B.6): energy release rates Y_i, coupled forces Ybar_i and the
 * evolution functions F_i with their derivatives. Plain-number functions: no allocation.
 */
import type { Material } from "./material";

/** Y_i = (<s_ii>+² + k6·s12²) / (2 E_i (1 − d_i)²), stresses in the damage frame (spec B.5). */
export function releaseRate(sNormal: number, sShear: number, k6: number, E: number, d: number) {
  const sp = sNormal > 0 ? sNormal : 0;
  const om = 1 - d;
  return (sp * sp + k6 * sShear * sShear) / (2 * E * om * om);
}

/** F_1 or F_2 of spec B.6, capped at dmax; `family` is 1 or 2. */
export function evolutionF(m: Material, family: number, ybar: number): number {
  const a = family === 1 ? m.a1 : m.a2;
  let f: number;
  if (m.linY) {
    const y0 = family === 1 ? m.Y01 : m.Y02;
    f = ybar > y0 ? a * (ybar - y0) : 0;
  } else {
    const s0 = family === 1 ? m.sqrtY01 : m.sqrtY02;
    const sq = ybar > 0 ? Math.sqrt(ybar) : 0;
    f = sq > s0 ? a * (sq - s0) : 0;
  }
  return f < m.dmax ? f : m.dmax;
}

/**
 * dF_i/dYbar_i on the growing, uncapped branch (a/(2·sqrt(Ybar)) or a). The caller multiplies by
 * chi_i (loading and not capped, spec C.5), so the value off that branch does not matter.
 */
export function evolutionSlope(m: Material, family: number, ybar: number): number {
  const a = family === 1 ? m.a1 : m.a2;
  if (m.linY) return a;
  return ybar > 0 ? a / (2 * Math.sqrt(ybar)) : 0;
}

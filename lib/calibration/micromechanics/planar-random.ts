/**
 * Planar-random (in-plane isotropic) average of an aligned ply through the Tsai–Pagano
 * invariants (spec A.4; Tsai & Pagano 1968). Moduli in MPa.
 */
import type { AlignedPly } from "./halpin-tsai";

export interface InPlaneIsotropic {
  E: number; // MPa
  nu: number;
  G: number; // MPa
}

/** Exact average: U1, U4, U5 of the reduced stiffness Q, then E_r, nu_r, G_r. */
export function planarRandom(ply: AlignedPly): InPlaneIsotropic {
  const nu21 = (ply.nu12 * ply.E22) / ply.E11;
  const den = 1 - ply.nu12 * nu21;
  const Q11 = ply.E11 / den;
  const Q22 = ply.E22 / den;
  const Q12 = (ply.nu12 * ply.E22) / den;
  const Q66 = ply.G12;
  const U1 = (3 * Q11 + 3 * Q22 + 2 * Q12 + 4 * Q66) / 8;
  const U4 = (Q11 + Q22 + 6 * Q12 - 4 * Q66) / 8;
  const U5 = (Q11 + Q22 - 2 * Q12 + 4 * Q66) / 8;
  return { E: (U1 * U1 - U4 * U4) / U1, nu: U4 / U1, G: U5 };
}

/** The classic hand shortcut E ≈ 3/8·E11 + 5/8·E22, G ≈ 1/8·E11 + 1/4·E22 (no Poisson ratio). */
export function planarRandomShortcut(ply: AlignedPly): { E: number; G: number } {
  return {
    E: (3 / 8) * ply.E11 + (5 / 8) * ply.E22,
    G: (1 / 8) * ply.E11 + (1 / 4) * ply.E22,
  };
}

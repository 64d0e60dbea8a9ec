/**
 * Halpin–Tsai estimates of an aligned short-fibre ply (spec A.4; Halpin & Kardos 1976).
 * Moduli in MPa; Poisson ratios dimensionless; volume fraction Vf in [0, 1).
 */

export interface Constituents {
  Ef: number; // MPa, fibre Young's modulus
  nuf: number; // fibre Poisson ratio
  Em: number; // MPa, matrix Young's modulus
  num: number; // matrix Poisson ratio
  Vf: number; // fibre volume fraction
  aspect: number; // l/d, fibre length over diameter
}

export interface AlignedPly {
  E11: number; // MPa, along the fibres
  E22: number; // MPa, across
  G12: number; // MPa
  nu12: number;
}

/** Shear modulus of an isotropic solid from E and nu. */
export function isotropicShear(E: number, nu: number): number {
  return E / (2 * (1 + nu));
}

/** P/Pm = (1 + zeta·eta·Vf)/(1 − eta·Vf), eta = (Pf/Pm − 1)/(Pf/Pm + zeta). */
export function halpinTsai(Pf: number, Pm: number, zeta: number, Vf: number): number {
  const ratio = Pf / Pm;
  const eta = (ratio - 1) / (ratio + zeta);
  return (Pm * (1 + zeta * eta * Vf)) / (1 - eta * Vf);
}

/** zeta = 2·l/d for E11, 2 for E22, 1 for G12; nu12 by the rule of mixtures. */
export function alignedPly(c: Constituents): AlignedPly {
  const Gf = isotropicShear(c.Ef, c.nuf);
  const Gm = isotropicShear(c.Em, c.num);
  return {
    E11: halpinTsai(c.Ef, c.Em, 2 * c.aspect, c.Vf),
    E22: halpinTsai(c.Ef, c.Em, 2, c.Vf),
    G12: halpinTsai(Gf, Gm, 1, c.Vf),
    nu12: c.Vf * c.nuf + (1 - c.Vf) * c.num,
  };
}

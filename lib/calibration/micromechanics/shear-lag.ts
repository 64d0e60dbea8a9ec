/**
 * Short-fibre length and orientation effects (spec A.4): Cox shear lag (Cox 1952), the
 * Cox–Krenchel modulus with Krenchel's orientation factor (Krenchel 1964) and the Kelly–Tyson
 * critical length and strength (Kelly & Tyson 1965). Moduli and strengths in MPa; lengths in any
 * one unit (mm throughout the tests).
 */
import { isotropicShear, type Constituents } from "./halpin-tsai";

/** Krenchel's orientation factor for fibres random in a plane. */
export const ETA_O_PLANAR = 3 / 8;

/** ln(R/r) for hexagonal packing: ½·ln(pi/(2·sqrt(3)·Vf)). */
function hexagonalLogRatio(Vf: number): number {
  return 0.5 * Math.log(Math.PI / (2 * Math.sqrt(3) * Vf));
}

/** Cox length efficiency eta_l = 1 − tanh(x)/x with x = (l/d)·sqrt(2·Gm/(Ef·ln(R/r))). */
export function coxLengthEfficiency(c: Constituents): { etaL: number; x: number } {
  const Gm = isotropicShear(c.Em, c.num);
  const x = c.aspect * Math.sqrt((2 * Gm) / (c.Ef * hexagonalLogRatio(c.Vf)));
  return { etaL: 1 - Math.tanh(x) / x, x };
}

/** Cox–Krenchel modulus E ≈ eta_o·eta_l·Vf·Ef + (1 − Vf)·Em. */
export function coxKrenchelModulus(c: Constituents, etaO = ETA_O_PLANAR): number {
  return etaO * coxLengthEfficiency(c).etaL * c.Vf * c.Ef + (1 - c.Vf) * c.Em;
}

export interface KellyTysonInput {
  sigmaFu: number; // MPa, fibre strength
  diameter: number; // fibre diameter (same length unit as `length`)
  tau: number; // MPa, interfacial shear strength
  length: number; // fibre length
  Vf: number;
  sigmaM: number; // MPa, matrix stress at the composite's failure strain
}

/** Critical length l_c = sigma_fu·d/(2·tau). */
export function kellyTysonCriticalLength(sigmaFu: number, diameter: number, tau: number): number {
  return (sigmaFu * diameter) / (2 * tau);
}

/**
 * Composite strength: sub-critical fibres (l < l_c) carry tau·(l/d) on average, longer ones
 * sigma_fu·(1 − l_c/(2l)). etaO = 1 for aligned fibres, 3/8 for planar random.
 */
export function kellyTysonStrength(k: KellyTysonInput, etaO = 1): number {
  const lc = kellyTysonCriticalLength(k.sigmaFu, k.diameter, k.tau);
  const fibre =
    k.length < lc ? k.tau * (k.length / k.diameter) : k.sigmaFu * (1 - lc / (2 * k.length));
  return etaO * fibre * k.Vf + (1 - k.Vf) * k.sigmaM;
}

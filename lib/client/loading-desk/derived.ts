/**
 * What a parameter set means on paper: the closed forms of uniaxial tension along each damage
 * axis (damage-law.md D.4; B.6 for the linY law). Stress MPa, strain mm/mm.
 */
import type { MaterialParams } from "@/lib/mechanics/types";

export interface AxisMeaning {
  /** Threshold stress sqrt(2·E·Y0) and its strain. */
  thresholdStress: number;
  thresholdStrain: number;
  /** Damage, stress and strain at the stress peak. */
  peakDamage: number;
  peakStress: number;
  peakStrain: number;
  /** Unloading (secant) modulus E·(1 − d) at the peak. */
  unloadingModulusAtPeak: number;
  /** Where d reaches dcrit (the failure flag); before the peak when dcrit < peakDamage. */
  failureStress: number;
  failureStrain: number;
  failsBeforePeak: boolean;
}

type Axis = { E: number; Y0: number; a: number; alpha: number };

function curve(p: Pick<MaterialParams, "law">, ax: Axis) {
  // sqrtY: sqrt(Y) = sqrt(Y0) + d/a ; linY: Y = Y0 + d/a. Effective stress s/(1−d) = sqrt(2·E·Y).
  const sqrtY = (d: number) =>
    p.law === "linY" ? Math.sqrt(ax.Y0 + d / ax.a) : Math.sqrt(ax.Y0) + d / ax.a;
  const stress = (d: number) => (1 - d) * Math.sqrt(2 * ax.E) * sqrtY(d);
  const strain = (d: number) => Math.sqrt(2 / ax.E) * sqrtY(d) + ax.alpha * d;
  return { stress, strain };
}

function axisMeaning(p: MaterialParams, ax: Axis): AxisMeaning | null {
  const values = [ax.E, ax.Y0, ax.a, ax.alpha, p.dcrit, p.dmax];
  if (!values.every(Number.isFinite) || ax.E <= 0 || ax.Y0 <= 0 || ax.a <= 0) return null;
  const raw = p.law === "linY" ? (1 - 2 * ax.a * ax.Y0) / 3 : (1 - ax.a * Math.sqrt(ax.Y0)) / 2;
  if (!(raw > 0)) return null;
  const peakDamage = Math.min(raw, p.dmax);
  const { stress, strain } = curve(p, ax);
  const thresholdStress = Math.sqrt(2 * ax.E * ax.Y0);
  return {
    thresholdStress,
    thresholdStrain: thresholdStress / ax.E,
    peakDamage,
    peakStress: stress(peakDamage),
    peakStrain: strain(peakDamage),
    unloadingModulusAtPeak: ax.E * (1 - peakDamage),
    failureStress: stress(p.dcrit),
    failureStrain: strain(p.dcrit),
    failsBeforePeak: p.dcrit < peakDamage,
  };
}

/** Meanings for tension along axis 1 and axis 2; null where the values do not allow one. */
export function deriveMeanings(p: MaterialParams): [AxisMeaning | null, AxisMeaning | null] {
  return [
    axisMeaning(p, { E: p.E1, Y0: p.Y0_1, a: p.a1, alpha: p.alpha }),
    axisMeaning(p, { E: p.E2, Y0: p.Y0_2, a: p.a2, alpha: p.beta }),
  ];
}

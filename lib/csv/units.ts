/**
 * Units of the strain and stress columns. The core works in mm/mm and MPa (spec A.1). A unit
 * written in the header ("strain [%]", "stress (MPa)") is taken as chosen; otherwise the spec E.1
 * rule detects percent strain and Pa stress from the magnitudes, with a warning.
 */
import { findTrailingUnit } from "./trailing-unit";

export const STRAIN_UNITS = ["mm/mm", "percent", "µm/m"] as const;
export const STRESS_UNITS = ["Pa", "kPa", "MPa", "GPa"] as const;
export type StrainUnit = (typeof STRAIN_UNITS)[number];
export type StressUnit = (typeof STRESS_UNITS)[number];

/** Factor to mm/mm. */
export const STRAIN_FACTOR: Record<StrainUnit, number> = {
  "mm/mm": 1,
  percent: 0.01,
  "µm/m": 1e-6,
};
/** Factor to MPa. */
export const STRESS_FACTOR: Record<StressUnit, number> = { Pa: 1e-6, kPa: 1e-3, MPa: 1, GPa: 1e3 };

/** The text inside the last [...] or (...) of a header, if any. */
export function headerUnitText(header: string): string | null {
  const unit = findTrailingUnit(header);
  return unit ? header.slice(unit.open + 1, unit.close).trim() : null;
}

export function strainUnitFromHeader(header: string): StrainUnit | null {
  const unit = headerUnitText(header)?.toLowerCase().replace(/\s/g, "");
  if (unit === undefined) return null;
  if (unit === "%") return "percent";
  if (["mm/mm", "m/m", "-", "1", "in/in"].includes(unit)) return "mm/mm";
  if (/^[µμu](m\/m|ε)$/.test(unit)) return "µm/m";
  return null;
}

export function stressUnitFromHeader(header: string): StressUnit | null {
  const unit = headerUnitText(header)?.replace(/\s/g, "");
  if (unit === undefined) return null;
  const lower = unit.toLowerCase();
  if (lower === "n/mm²" || lower === "n/mm2" || lower === "n/mm^2") return "MPa";
  if (lower === "n/m²" || lower === "n/m2" || lower === "n/m^2") return "Pa";
  // Case matters between mPa and MPa only in theory; nobody writes milli-pascal for a coupon.
  const byName: Record<string, StressUnit> = { pa: "Pa", kpa: "kPa", mpa: "MPa", gpa: "GPa" };
  return byName[lower] ?? null;
}

function maxAbs(values: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < values.length; i++) {
    const v = Math.abs(values[i]);
    if (Number.isFinite(v) && v > m) m = v;
  }
  return m;
}

/** Spec E.1: max|strain| > 0.2 means percent. */
export function detectStrainUnit(values: ArrayLike<number>): StrainUnit {
  return maxAbs(values) > 0.2 ? "percent" : "mm/mm";
}

/** Spec E.1: max|stress| > 1e5 means Pa. */
export function detectStressUnit(values: ArrayLike<number>): StressUnit {
  return maxAbs(values) > 1e5 ? "Pa" : "MPa";
}

/** Force and extension units a machine writes; the core wants N and mm before the geometry. */
export const FORCE_UNITS = ["N", "kN"] as const;
export const LENGTH_UNITS = ["mm", "µm"] as const;
export type ForceUnit = (typeof FORCE_UNITS)[number];
export type LengthUnit = (typeof LENGTH_UNITS)[number];
/** Factor to N. */
export const FORCE_FACTOR: Record<ForceUnit, number> = { N: 1, kN: 1e3 };
/** Factor to mm. */
export const LENGTH_FACTOR: Record<LengthUnit, number> = { mm: 1, µm: 1e-3 };

export function forceUnitFromHeader(header: string): ForceUnit | null {
  const unit = headerUnitText(header)?.replace(/\s/g, "").toLowerCase();
  if (unit === "n") return "N";
  if (unit === "kn") return "kN";
  return null;
}

export function lengthUnitFromHeader(header: string): LengthUnit | null {
  const unit = headerUnitText(header)?.replace(/\s/g, "").toLowerCase();
  if (unit === "mm") return "mm";
  if (unit !== undefined && /^[µμu]m$/.test(unit)) return "µm";
  return null;
}

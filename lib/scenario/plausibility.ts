/**
 * Soft warnings for values that the law admits but that no short-fibre composite has: a typo
 * (a modulus in GPa typed as MPa, an exponent slip to 1e308) shows up here before it reaches a
 * chart or a hand-off. These never block a run: the hard limits are the law's admissible ranges
 * (parameter-set-schema.ts). The usual ranges are common practice for polymer-matrix composites,
 * written from experience, not from a standard; they are deliberately wide.
 */

export interface PlausibilityWarning {
  field: string;
  message: string;
  /**
   * "implausible": more than a thousand times outside the usual range (1e308, a unit slip of
   * 10^6). The desk keeps showing the last plausible curves rather than plot it; files and the
   * API still accept it, since the law admits it.
   */
  severity: "unusual" | "implausible";
}

/** How far outside the usual range a value must be before the desk stops plotting it. */
const IMPLAUSIBLE_FACTOR = 1000;

interface UsualRange {
  field: string;
  low: number;
  high: number;
  unit: string;
  why: string;
}

const USUAL: readonly UsualRange[] = [
  { field: "E1", low: 100, high: 500_000, unit: "MPa", why: "from soft polymers to carbon fibre" },
  { field: "E2", low: 100, high: 500_000, unit: "MPa", why: "from soft polymers to carbon fibre" },
  { field: "G12", low: 50, high: 200_000, unit: "MPa", why: "polymer-matrix composites" },
  { field: "nu12", low: 0.05, high: 0.6, unit: "", why: "polymer-matrix composites" },
  { field: "Y0_1", low: 1e-4, high: 10, unit: "MPa", why: "damage thresholds of coupon tests" },
  { field: "Y0_2", low: 1e-4, high: 10, unit: "MPa", why: "damage thresholds of coupon tests" },
  { field: "Xc", low: 10, high: 5_000, unit: "MPa", why: "compressive strengths of composites" },
];

function formatBound(value: number, unit: string): string {
  const text = value >= 10_000 ? `${value / 1000} G${unit.slice(1)}` : `${value} ${unit}`;
  return unit === "" ? String(value) : text.trim();
}

/** Warnings for the fields of `set` outside their usual range; fields not given are skipped. */
export function plausibilityWarnings(set: Record<string, unknown>): PlausibilityWarning[] {
  const warnings: PlausibilityWarning[] = [];
  for (const range of USUAL) {
    const value = set[range.field];
    if (typeof value !== "number" || !Number.isFinite(value)) continue;
    if (value >= range.low && value <= range.high) continue;
    const usual = `${formatBound(range.low, range.unit)} to ${formatBound(range.high, range.unit)}`;
    const implausible =
      value < range.low / IMPLAUSIBLE_FACTOR || value > range.high * IMPLAUSIBLE_FACTOR;
    const given = `${range.field} = ${value}${range.unit ? ` ${range.unit}` : ""}`;
    warnings.push({
      field: range.field,
      severity: implausible ? "implausible" : "unusual",
      message: implausible
        ? `${given} is far outside the usual ${usual} (${range.why}). Type the value in ${range.unit || "the unit shown"}; the charts keep the last plausible values.`
        : `${given} is outside the usual ${usual} (${range.why}). Check the unit and the exponent; the run goes ahead.`,
    });
  }
  return warnings;
}

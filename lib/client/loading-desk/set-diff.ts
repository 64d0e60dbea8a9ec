/** Side-by-side comparison of two parameter sets: one row per field, flagged where they differ. */
import { PARAMETER_FIELDS, unitOf } from "@/lib/scenario/parameter-fields";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

export interface DiffRow {
  symbol: string;
  unit: string;
  left: string;
  right: string;
  differs: boolean;
  /** Relative difference (right − left)/|left| for numbers, else null. */
  relative: number | null;
}

function show(v: unknown): string {
  if (v === null || v === undefined) return "off";
  return String(v);
}

export function diffSets(left: ParameterSet, right: ParameterSet): DiffRow[] {
  return PARAMETER_FIELDS.map((f) => {
    const a = (left as unknown as Record<string, unknown>)[f.symbol];
    const b = (right as unknown as Record<string, unknown>)[f.symbol];
    const numeric = typeof a === "number" && typeof b === "number";
    return {
      symbol: f.symbol,
      unit: unitOf(f, left.law),
      left: show(a),
      right: show(b),
      differs: !Object.is(a, b),
      relative: numeric && a !== 0 ? (b - a) / Math.abs(a) : null,
    };
  });
}

/** Side-by-side comparison of two parameter sets: one row per field, flagged where they differ. */
import { PARAMETER_FIELDS, unitOf, type ParameterField } from "@/lib/scenario/parameter-fields";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { shownNumber } from "@/lib/shared/shown-number";

export interface DiffRow {
  symbol: string;
  /** The parameter in words, for the row's tooltip (the symbol alone is the row's head). */
  label: string;
  unit: string;
  left: string;
  right: string;
  differs: boolean;
  /** Relative difference (right − left)/|left| for numbers, else null. */
  relative: number | null;
}

/** As the desk's fields show it: choices in words, numbers to the shown digits. */
function show(field: ParameterField, v: unknown): string {
  if (v === null || v === undefined) return "off";
  if (typeof v === "number") return shownNumber(v);
  return field.choiceWords?.[String(v)] ?? String(v);
}

export function diffSets(left: ParameterSet, right: ParameterSet): DiffRow[] {
  return PARAMETER_FIELDS.map((f) => {
    const a = (left as unknown as Record<string, unknown>)[f.symbol];
    const b = (right as unknown as Record<string, unknown>)[f.symbol];
    const numeric = typeof a === "number" && typeof b === "number";
    return {
      symbol: f.symbol,
      label: f.label,
      unit: unitOf(f, left.law),
      left: show(f, a),
      right: show(f, b),
      differs: !Object.is(a, b),
      relative: numeric && a !== 0 ? (b - a) / Math.abs(a) : null,
    };
  });
}

/**
 * The library page's value editor: which fields it offers (the numbers of spec A.3) and how a
 * draft is checked before it is sent, with each problem under the field's own label.
 */
import { PARAMETER_FIELDS, labelOf } from "@/lib/scenario/parameter-fields";
import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";

export const EDITABLE_FIELDS = PARAMETER_FIELDS.filter((f) => f.kind === "number");

export type ValuesDraft = Record<string, string>;

export function draftOf(values: Record<string, unknown>): ValuesDraft {
  return Object.fromEntries(
    EDITABLE_FIELDS.map((f) => [
      f.symbol,
      values[f.symbol] === undefined ? "" : String(values[f.symbol]),
    ]),
  );
}

export type CheckedDraft =
  { ok: true; values: Record<string, unknown> } | { ok: false; errors: Record<string, string> };

/** The stored values with the draft's numbers in; problems keyed by field, in people's words. */
export function checkDraft(stored: Record<string, unknown>, draft: ValuesDraft): CheckedDraft {
  const errors: Record<string, string> = {};
  const next: Record<string, unknown> = { ...stored };
  for (const f of EDITABLE_FIELDS) {
    const text = (draft[f.symbol] ?? "").trim();
    const value = Number(text);
    if (text === "" || !Number.isFinite(value)) {
      errors[f.symbol] = `${labelOf(f.symbol)}: give a number.`;
    } else next[f.symbol] = value;
  }
  if (Object.keys(errors).length) return { ok: false, errors };
  const result = parameterSetSchema.safeParse(next);
  if (result.success) return { ok: true, values: next };
  for (const issue of result.error.issues) {
    const symbol = String(issue.path[0] ?? "");
    if (!errors[symbol]) errors[symbol] = `${labelOf(symbol)}: ${issue.message}`;
  }
  return { ok: false, errors };
}

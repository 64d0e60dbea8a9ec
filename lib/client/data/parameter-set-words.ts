import { PARAMETER_FIELDS, unitOf } from "@/lib/scenario/parameter-fields";

import { formatValue } from "./format";

/** The values a table row shows: stiffness, thresholds and the critical damage. */
const KEY_SYMBOLS = ["E1", "E2", "G12", "Y0_1", "Y0_2", "dcrit"] as const;

export function keyValues(values: Record<string, unknown>): [string, string][] {
  return KEY_SYMBOLS.filter((k) => values[k] !== undefined).map((k) => [k, formatValue(values[k])]);
}

export interface ProvenanceLike {
  kind: string;
  records?: string[];
  method?: string;
}

/** "fitted from 3 test records (least squares)", "typed in", "derived from constituents". */
export function provenanceText(p: ProvenanceLike): string {
  if (p.kind === "fitted") {
    const n = p.records?.length ?? 0;
    const from = n ? ` from ${n} test record${n === 1 ? "" : "s"}` : "";
    return `fitted${from}${p.method ? ` (${p.method})` : ""}`;
  }
  if (p.kind === "constituents") return "derived from constituents";
  return "typed in";
}

/** Every value of a set in the law's order, with its unit; fields the law does not know last. */
export function allValues(values: Record<string, unknown>): { symbol: string; text: string }[] {
  const known = PARAMETER_FIELDS.filter((f) => f.symbol in values).map((f) => {
    const value = values[f.symbol];
    const typeset = unitOf(f, values.law);
    const unit = typeof value === "number" && typeset !== "–" ? typeset : "";
    return { symbol: f.symbol, text: `${formatValue(value)}${unit ? ` ${unit}` : ""}` };
  });
  const knownSymbols = new Set(PARAMETER_FIELDS.map((f) => f.symbol));
  const rest = Object.keys(values)
    .filter((k) => !knownSymbols.has(k) && k !== "label" && k !== "id")
    .sort()
    .map((k) => ({ symbol: k, text: formatValue(values[k]) }));
  return [...known, ...rest];
}

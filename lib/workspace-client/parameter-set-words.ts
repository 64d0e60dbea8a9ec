import { formatValue } from "./format";

/** The values a table row shows: stiffness, thresholds and the critical damage. */
export const KEY_SYMBOLS = ["E1", "E2", "G12", "Y0_1", "Y0_2", "dcrit"] as const;

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

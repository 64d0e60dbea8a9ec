/** Rows of a result as tab-separated text with a header, for the clipboard (pastes into sheets). */
import { RESULT_COLUMNS, type ResultColumns } from "@/lib/mechanics/types";

export function rowsToTsv(cols: ResultColumns, from: number, to: number): string {
  const lo = Math.max(0, Math.min(from, to));
  const hi = Math.max(from, to);
  const lines = [RESULT_COLUMNS.join("\t")];
  for (let i = lo; i <= hi; i++)
    lines.push(RESULT_COLUMNS.map((c) => String(cols[c][i])).join("\t"));
  return lines.join("\n");
}

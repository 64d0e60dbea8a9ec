/**
 * One call from file text to points: parse, suggest a mapping (unless one is given), extract.
 * The mapping step of the upload uses the pieces; the worker and tests use this.
 */
import { suggestMapping, type ColumnMapping } from "./column-mapping";
import { csvError, type CsvError } from "./csv-error";
import { extractPoints, type CurvePoints } from "./extract-points";
import { parseCurveTable, type CurveTable, type ParseTableOptions } from "./parse-table";
import { columnMappingSchema, type ColumnMappingInput } from "./record-schema";

export type ReadResult =
  | {
      ok: true;
      table: CurveTable;
      suggested: ColumnMapping;
      points: CurvePoints;
      warnings: string[];
    }
  | { ok: false; error: CsvError; points: null };

export function readCurveCsv(
  text: string,
  mapping?: ColumnMappingInput,
  options?: ParseTableOptions,
): ReadResult {
  const parsed = parseCurveTable(text, options);
  if (!parsed.ok) return { ok: false, error: parsed.error, points: null };
  const suggested = suggestMapping(parsed.table.headers, parsed.table.hasHeader);
  const chosen = columnMappingSchema.safeParse(mapping ?? suggested);
  if (!chosen.success) {
    const message =
      mapping === undefined
        ? "no strain and stress columns recognised in the header; map them by hand."
        : chosen.error.issues
            .map((i) => `${i.path.join(".") || "mapping"}: ${i.message}`)
            .join("; ");
    return { ok: false, error: csvError("mapping", message), points: null };
  }
  const extracted = extractPoints(parsed.table, chosen.data);
  if (!extracted.ok) return { ok: false, error: extracted.error, points: null };
  return {
    ok: true,
    table: parsed.table,
    suggested,
    points: extracted.points,
    warnings: extracted.warnings,
  };
}

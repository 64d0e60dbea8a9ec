/**
 * What the mapping step shows for one file: headers, the first rows, the suggested mapping, and
 * (once a mapping is chosen) the points thinned for a chart plus the unit warnings. Pure: runs
 * in the CSV worker on the user's machine; the server re-parses with the same lib/csv code.
 */
import { suggestMapping, type ColumnMapping } from "@/lib/csv/column-mapping";
import type { CsvError } from "@/lib/csv/csv-error";
import { extractPoints } from "@/lib/csv/extract-points";
import { parseCurveTable } from "@/lib/csv/parse-table";
import { columnMappingSchema, type ColumnMappingInput } from "@/lib/csv/record-schema";

import { thinForDisplay } from "./stored-points";

export interface CsvPreview {
  headers: string[];
  rowCount: number;
  delimiter: string;
  decimalComma: boolean;
  firstRows: number[][];
  suggested: ColumnMapping;
  /** With the given (or suggested) mapping; null when the mapping is incomplete. */
  curve: { x: number[]; y: number[]; strainUnit: string; stressUnit: string } | null;
  warnings: string[];
  error: CsvError | null;
}

export type PreviewResult = { ok: true; preview: CsvPreview } | { ok: false; error: CsvError };

export function previewCsv(text: string, mapping?: ColumnMappingInput): PreviewResult {
  const parsed = parseCurveTable(text);
  if (!parsed.ok) return { ok: false, error: parsed.error };
  const { table } = parsed;
  const suggested = suggestMapping(table.headers, table.hasHeader);
  const firstRows = Array.from({ length: Math.min(6, table.rowCount) }, (_, r) =>
    table.columns.map((c) => c[r]),
  );
  const preview: CsvPreview = {
    headers: table.headers,
    rowCount: table.rowCount,
    delimiter: table.delimiter === "\t" ? "tab" : table.delimiter,
    decimalComma: table.decimalComma,
    firstRows,
    suggested,
    curve: null,
    warnings: [],
    error: null,
  };
  const chosen = columnMappingSchema.safeParse(mapping ?? suggested);
  if (!chosen.success) return { ok: true, preview };
  const extracted = extractPoints(table, chosen.data);
  if (!extracted.ok) return { ok: true, preview: { ...preview, error: extracted.error } };
  const { points } = extracted;
  preview.curve = {
    ...thinForDisplay(points.strain, points.stress),
    strainUnit: points.strainUnit,
    stressUnit: points.stressUnit,
  };
  preview.warnings = extracted.warnings;
  return { ok: true, preview };
}

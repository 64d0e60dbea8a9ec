/**
 * From a file as a testing machine writes it to a record's points: layout (detected, then the
 * engineer's choices on top), quantities (stress and strain as mapped, or derived from force,
 * extension and the geometry), then the usual extraction. The upload's preview and the server
 * run this one function, so what was shown is what is stored.
 */
import { suggestQuantities, type QuantityMapping } from "./column-mapping";
import { resolveQuantities, type Conversion } from "./convert-quantities";
import { csvError, type CsvError } from "./csv-error";
import { extractPoints, type CurvePoints } from "./extract-points";
import { detectLayout, type FileLayout } from "./file-layout";
import { parseCurveTable, type CurveTable } from "./parse-table";
import { recordMappingSchema, type RecordMapping, type RecordMappingInput } from "./record-mapping";
import type { ColumnMappingChoice } from "./record-schema";

export interface TableRead {
  table: CurveTable;
  detected: FileLayout;
  layout: FileLayout;
  suggested: QuantityMapping;
}

export type RecordRead =
  | {
      ok: true;
      table: CurveTable; // with the derived columns appended
      layout: FileLayout;
      points: CurvePoints;
      choice: ColumnMappingChoice; // the columns extracted, derived ones included
      conversion: Conversion;
      warnings: string[];
    }
  | { ok: false; error: CsvError; missing: string | null };

/** The table under the detected layout with the given choices on top. */
export function readTable(
  text: string,
  layoutChoice: RecordMappingInput["layout"] = {},
): { ok: true; read: TableRead } | { ok: false; error: CsvError } {
  const detected = detectLayout(text);
  const layout: FileLayout = { ...detected, ...stripUndefined(layoutChoice) };
  const parsed = parseCurveTable(text, layout);
  if (!parsed.ok) return parsed;
  const suggested = suggestQuantities(parsed.table.headers, parsed.table.hasHeader);
  return { ok: true, read: { table: parsed.table, detected, layout, suggested } };
}

function stripUndefined<T extends object>(value: T): Partial<T> {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as Partial<T>;
}

/** Points from a table and a full mapping; `missing` says in words what the mapping lacks. */
export function pointsFromTable(table: CurveTable, mapping: RecordMapping) {
  const resolved = resolveQuantities(table, mapping);
  if (!resolved.ok) {
    return "missing" in resolved
      ? {
          ok: false as const,
          error: csvError("mapping", resolved.missing),
          missing: resolved.missing,
        }
      : { ok: false as const, error: resolved.error, missing: null };
  }
  const extracted = extractPoints(resolved.table, resolved.choice);
  if (!extracted.ok) return { ok: false as const, error: extracted.error, missing: null };
  return {
    ok: true as const,
    table: resolved.table,
    points: extracted.points,
    choice: resolved.choice,
    conversion: resolved.conversion,
    warnings: [...resolved.warnings, ...extracted.warnings],
  };
}

export function readRecordCsv(text: string, input: RecordMappingInput): RecordRead {
  const checked = recordMappingSchema.safeParse(input);
  if (!checked.success) {
    const message = checked.error.issues.map((i) => i.message).join("; ");
    return { ok: false, error: csvError("mapping", message), missing: null };
  }
  const mapping = checked.data;
  const tabled = readTable(text, mapping.layout);
  if (!tabled.ok) return { ok: false, error: tabled.error, missing: null };
  const out = pointsFromTable(tabled.read.table, mapping);
  return out.ok ? { ...out, layout: tabled.read.layout } : out;
}

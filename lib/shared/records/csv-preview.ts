/**
 * What the upload shows for one file: the layout (as detected and as chosen), headers with their
 * units, the first rows, the suggested columns, and (once stress and strain can be made) the
 * points thinned for a chart, the unit warnings, and in words what is still missing. Pure: runs
 * in the CSV worker on the user's machine; the server re-reads with the same lib/csv code.
 */
import type { QuantityMapping } from "@/lib/csv/column-mapping";
import type { CsvError } from "@/lib/csv/csv-error";
import type { FileLayout } from "@/lib/csv/file-layout";
import { pointsFromTable, readTable } from "@/lib/csv/read-record-csv";
import { recordMappingSchema, type RecordMappingInput } from "@/lib/csv/record-mapping";

import { thinForDisplay } from "./stored-points";

export interface CsvPreview {
  detected: FileLayout;
  layout: FileLayout;
  headers: string[];
  rowCount: number;
  delimiter: string;
  decimalComma: boolean;
  firstRows: number[][];
  firstLines: number[];
  suggested: QuantityMapping;
  /** The mapping the preview used (the suggestion where no column was chosen). */
  mapping: RecordMappingInput;
  /** Stress–strain after any conversion; null while something is missing or wrong. */
  curve: { x: number[]; y: number[]; strainUnit: string; stressUnit: string } | null;
  warnings: string[];
  error: CsvError | null;
  /** What the engineer still has to give, in words; null when nothing is missing. */
  missing: string | null;
}

export type PreviewResult =
  | { ok: true; preview: CsvPreview }
  | { ok: false; error: CsvError; detected?: FileLayout; layout?: FileLayout };

const COLUMN_KEYS = [
  "strain",
  "stress",
  "force",
  "extension",
  "time",
  "transverseStrain",
  "shearStrain",
  "shearStress",
] as const;

function withSuggestion(mapping: RecordMappingInput, suggested: QuantityMapping) {
  const chosen = COLUMN_KEYS.some((k) => mapping[k] !== undefined);
  return chosen ? mapping : { ...suggested, ...mapping };
}

export function previewCsv(text: string, mapping: RecordMappingInput = {}): PreviewResult {
  const tabled = readTable(text, mapping.layout);
  if (!tabled.ok) {
    const failed = readTable(text.slice(0, 20_000), {}); // the detection, to show beside the error
    const detected = failed.ok ? failed.read.detected : undefined;
    return {
      ok: false,
      error: tabled.error,
      detected,
      layout: { ...detected, ...mapping.layout } as FileLayout,
    };
  }
  const { table, detected, layout, suggested } = tabled.read;
  const effective = withSuggestion(mapping, suggested);
  const shown = Math.min(6, table.rowCount);
  const preview: CsvPreview = {
    detected,
    layout,
    headers: table.headers,
    rowCount: table.rowCount,
    delimiter: table.delimiter === "\t" ? "tab" : table.delimiter,
    decimalComma: table.decimalComma,
    firstRows: Array.from({ length: shown }, (_, r) => table.columns.map((c) => c[r])),
    firstLines: Array.from(table.lines.slice(0, shown)),
    suggested,
    mapping: effective,
    curve: null,
    warnings: [],
    error: null,
    missing: null,
  };
  const checked = recordMappingSchema.safeParse(effective);
  if (!checked.success) {
    const message = checked.error.issues.map((i) => i.message).join("; ");
    return { ok: true, preview: { ...preview, missing: message } };
  }
  const out = pointsFromTable(table, checked.data);
  if (!out.ok) {
    return out.missing
      ? { ok: true, preview: { ...preview, missing: out.missing } }
      : { ok: true, preview: { ...preview, error: out.error } };
  }
  preview.curve = {
    ...thinForDisplay(out.points.strain, out.points.stress),
    strainUnit: out.points.strainUnit,
    stressUnit: out.points.stressUnit,
  };
  preview.warnings = out.warnings;
  return { ok: true, preview };
}

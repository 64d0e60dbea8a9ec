/**
 * Results CSV downloads of the loading desk (issue 15 item 3): one header line with units
 * (export-columns), numbers to a stated number of significant digits, every stored increment.
 * One set, or all sets in one file with a first column `set`. Which scenario, revision and values
 * made the file goes in a separate provenance file (provenance.ts): comment lines would break
 * spreadsheets and pandas read without options. The command line's contract CSV is
 * lib/scenario/results-csv and is not written here.
 */
import { RESULT_COLUMNS } from "@/lib/mechanics/types";
import { csvRow, csvText } from "@/lib/shared/csv-writer";
import { EXPORT_HEADINGS, exportNumber } from "./export-columns";
import type { ResultBuffer } from "./result-buffer";

export const EXPORT_HEADER = csvRow(RESULT_COLUMNS.map((c) => EXPORT_HEADINGS[c]));

function rowLines(buffer: ResultBuffer, prefix: string): string[] {
  const arrays = RESULT_COLUMNS.map((c) => buffer.columns[c]);
  const lines: string[] = [];
  for (let r = 0; r < buffer.rows; r++)
    lines.push(prefix + arrays.map((a) => exportNumber(a[r])).join(","));
  return lines;
}

export function setCsv(buffer: ResultBuffer): string {
  return [EXPORT_HEADER, ...rowLines(buffer, "")].join("\n") + "\n";
}

export function allSetsCsv(sets: { id: string; buffer: ResultBuffer }[]): string {
  const lines = [`set,${EXPORT_HEADER}`];
  // The result cells are numbers only; the set id is the one text cell and is quoted as needed.
  for (const { id, buffer } of sets) lines.push(...rowLines(buffer, `${csvText(id)},`));
  return lines.join("\n") + "\n";
}

/**
 * CSV form of a run's result columns (scenario-file.md, command-line driver): a header with the
 * contract's column names, then one line per stored increment, numbers in shortest round-trip form.
 */
import { RESULT_COLUMNS, type ResultColumns } from "@/lib/mechanics/types";
import { csvNumber, csvRow } from "@/lib/shared/csv-writer";

export { resultsToJson, resultsJsonChunks } from "./results-json";

export const CSV_HEADER = csvRow(RESULT_COLUMNS);

/**
 * The CSV text in pieces of `rowsPerChunk` lines, so a 1,000,000-row run never has to be one
 * string (a V8 string tops out near 512 MB). The first piece starts with the header.
 */
export function* resultsCsvChunks(
  columns: ResultColumns,
  rows: number,
  rowsPerChunk = 4096,
): Generator<string> {
  const arrays = RESULT_COLUMNS.map((name) => columns[name]);
  const width = arrays.length;
  let chunk = CSV_HEADER + "\n";
  // csvNumber is String(x): the shortest round-trip form and writes -0 as "0"; increment, leg and failed are
  // stored as whole numbers, so they print without a decimal point.
  for (let r = 0; r < rows; r++) {
    let line = csvNumber(arrays[0][r]);
    for (let c = 1; c < width; c++) line += "," + csvNumber(arrays[c][r]);
    chunk += line + "\n";
    if ((r + 1) % rowsPerChunk === 0) {
      yield chunk;
      chunk = "";
    }
  }
  if (chunk !== "") yield chunk;
}

/** The whole CSV as one string (header + `rows` lines, each ending in "\n"). */
export function resultsToCsv(columns: ResultColumns, rows: number): string {
  let out = "";
  for (const chunk of resultsCsvChunks(columns, rows)) out += chunk;
  return out;
}

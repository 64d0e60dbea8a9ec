/** What went wrong in a file, said for the engineer who exported it: always a line, a cell if any. */
export type CsvErrorCode =
  | "empty"
  | "too-large"
  | "too-many-rows"
  | "too-many-columns"
  | "header-too-long"
  | "delimiter"
  | "quotes"
  | "ragged"
  | "not-a-number"
  | "no-data"
  | "mapping";

export interface CsvError {
  code: CsvErrorCode;
  line: number | null; // 1-based physical line in the file
  column: string | null; // header (or "column N") of the cell
  message: string;
}

export function csvError(
  code: CsvErrorCode,
  message: string,
  line: number | null = null,
  column: string | null = null,
): CsvError {
  const where =
    line === null ? "" : column === null ? `line ${line}: ` : `line ${line}, column "${column}": `;
  return { code, line, column, message: where + message };
}

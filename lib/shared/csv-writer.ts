/**
 * The one CSV writer behind every export (issue 12 item 4). RFC 4180 quoting: a cell holding a
 * comma, a double quote, CR or LF is wrapped in double quotes with inner quotes doubled. Text that
 * a spreadsheet would run as a formula (first character = + - @, tab or CR) gets a leading `'`,
 * so `=cmd|' /C calc'!A0` in a set id opens as text. Numbers are written as numbers: String(x),
 * the shortest round-trip form, never prefixed, so the command-line results stay byte-identical.
 */

export type CsvValue = string | number | boolean | null | undefined;

const NEEDS_QUOTES = /[",\r\n]/;
const FORMULA_START = /^[=+\-@\t\r]/;

/** A number cell exactly as the results contract prints it (String(-0) is "0"). */
export function csvNumber(value: number): string {
  return String(value);
}

/**
 * A number cell rounded to `digits` significant digits, then in its shortest form: float noise
 * such as 0.000030000000000000004 is gone (0.00003), whole numbers stay whole, -0 is "0".
 * Non-finite values are written as String() writes them.
 */
export function csvSignificant(value: number, digits: number): string {
  if (!Number.isFinite(value)) return String(value);
  return String(Number(value.toPrecision(digits)));
}

/** A text cell: formula starts neutralised first, then quoted if it needs it. */
export function csvText(value: string): string {
  const safe = FORMULA_START.test(value) ? `'${value}` : value;
  return NEEDS_QUOTES.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** One cell of any kind; null and undefined are an empty cell. */
export function csvCell(value: CsvValue): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return csvNumber(value);
  if (typeof value === "boolean") return String(value);
  return csvText(value);
}

/** One line without its line end. */
export function csvRow(cells: readonly CsvValue[]): string {
  return cells.map(csvCell).join(",");
}

/** Whole rows, each ending in "\n" (the exports' line end; RFC 4180 allows it to be agreed). */
export function csvLines(rows: readonly (readonly CsvValue[])[]): string {
  return rows.map((r) => csvRow(r) + "\n").join("");
}

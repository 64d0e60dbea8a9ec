/**
 * Strict number cells. `Number()` accepts "", "0x1f" and " "; a measurement file must not, so the
 * accepted forms are spelled out. Instrument drop-outs written as NaN / inf parse to non-finite
 * values, which cleaning (spec E.1) drops row by row.
 */
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const DECIMAL_COMMA = /^[+-]?(\d+,?\d*|,\d+)([eE][+-]?\d+)?$/;
const NON_FINITE: Record<string, number> = {
  nan: Number.NaN,
  inf: Number.POSITIVE_INFINITY,
  "+inf": Number.POSITIVE_INFINITY,
  "-inf": Number.NEGATIVE_INFINITY,
  infinity: Number.POSITIVE_INFINITY,
  "+infinity": Number.POSITIVE_INFINITY,
  "-infinity": Number.NEGATIVE_INFINITY,
};

/** The number in a cell, or null when the cell is not a number. */
export function parseNumberCell(raw: string, decimalComma: boolean): number | null {
  const cell = raw.trim();
  if (cell === "") return null;
  if (decimalComma ? DECIMAL_COMMA.test(cell) : DECIMAL.test(cell)) {
    return Number(decimalComma ? cell.replace(",", ".") : cell);
  }
  const special = NON_FINITE[cell.toLowerCase()];
  return special === undefined ? null : special;
}

/** A cell written with a decimal comma, such as "0,0123" or "-45,6". */
export function looksLikeDecimalComma(raw: string): boolean {
  return /^[+-]?\d*,\d+([eE][+-]?\d+)?$/.test(raw.trim());
}

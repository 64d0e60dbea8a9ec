/**
 * Where the table starts in a file as a testing machine writes it: a block of metadata lines to
 * skip, a header row, an optional unit row under it, the delimiter and the decimal mark. The
 * detector proposes; the upload shows every value and the engineer may change any of them.
 */
import { z } from "zod";

import { detectDelimiter, type Delimiter } from "./detect-delimiter";
import { looksLikeDecimalComma, parseNumberCell } from "./number-cell";

export const layoutSchema = z.strictObject({
  skipLines: z.number().int().min(0).max(1000).optional(),
  headerRow: z.boolean().optional(),
  unitRow: z.boolean().optional(),
  delimiter: z.enum([",", ";", "\t"]).optional(),
  decimalComma: z.boolean().optional(),
});
export type LayoutChoice = z.infer<typeof layoutSchema>;
export type FileLayout = Required<LayoutChoice>;

const SAMPLE_LINES = 120;
const DELIMITERS: Delimiter[] = ["\t", ";", ","];

// Units a unit row holds, alone or in brackets: strain, stress, force, length, time, temperature.
const UNIT_CELL =
  /^[[(]?\s*(%|-|1|mm\/mm|m\/m|in\/in|[µμu]m\/m|[µμu]ε|pa|kpa|mpa|gpa|n\/mm²|n\/mm2|n|kn|mm|[µμu]m|m|s|sec|ms|min|h|°c|k|mm\/min|1\/s)\s*[\])]?$/i;

/** A cell of a unit row: a known unit, or empty (a column without one). */
export function looksLikeUnitCell(cell: string): boolean {
  const trimmed = cell.trim();
  return trimmed === "" || UNIT_CELL.test(trimmed);
}

function physicalLines(text: string): string[] {
  const lines: string[] = [];
  let start = 0;
  while (lines.length < SAMPLE_LINES && start <= text.length) {
    let end = text.indexOf("\n", start);
    if (end < 0) end = text.length;
    lines.push(text.slice(start, Math.min(end, start + 10_000)).replace(/\r$/, ""));
    start = end + 1;
  }
  return lines;
}

function cellsOf(line: string, delimiter: Delimiter): string[] {
  // Quotes around a header cell are common; a quoted delimiter inside one is not in the sample.
  return line.split(delimiter).map((c) => c.trim().replace(/^"(.*)"$/, "$1"));
}

/**
 * A data row: at least two cells are numbers and they are the majority. A column of notes beside
 * the numbers keeps a row a data row; a metadata line such as "Nominal width;10,0" is not one.
 */
function isNumericRow(cells: string[], decimalComma: boolean): boolean {
  const numbers = cells.filter((c) => parseNumberCell(c, decimalComma) !== null).length;
  return numbers >= 2 && 2 * numbers > cells.length;
}

function isTextRow(cells: string[], decimalComma: boolean): boolean {
  return cells.some((c) => c !== "" && parseNumberCell(c, decimalComma) === null);
}

interface Candidate {
  delimiter: Delimiter;
  decimalComma: boolean;
  numericRows: number;
  firstData: number; // index of the first numeric row of the data's width
  width: number;
}

function score(lines: string[], delimiter: Delimiter, decimalComma: boolean): Candidate {
  const widths = new Map<number, number>();
  const numeric = lines.map((line) => {
    const cells = cellsOf(line, delimiter);
    const yes = line.trim() !== "" && isNumericRow(cells, decimalComma);
    if (yes) widths.set(cells.length, (widths.get(cells.length) ?? 0) + 1);
    return yes ? cells.length : 0;
  });
  let width = 0;
  let count = 0;
  for (const [w, n] of widths) if (n > count) [width, count] = [w, n];
  return {
    delimiter,
    decimalComma,
    numericRows: count,
    firstData: numeric.indexOf(width),
    width,
  };
}

function previousFilled(lines: string[], before: number): number {
  for (let i = before - 1; i >= 0; i--) if (lines[i].trim() !== "") return i;
  return -1;
}

/**
 * The layout that reads the most rows as numbers of one width. Ties keep tab before semicolon
 * before comma, and the decimal point before the comma (whole numbers read the same either way).
 */
export function detectLayout(text: string): FileLayout {
  const lines = physicalLines(text);
  let best: Candidate | null = null;
  for (const delimiter of DELIMITERS) {
    for (const decimalComma of delimiter === "," ? [false] : [false, true]) {
      const c = score(lines, delimiter, decimalComma);
      if (best === null || c.numericRows > best.numericRows) best = c;
    }
  }
  if (best === null || best.numericRows === 0) {
    // Nothing reads as numbers: leave the table where it was, the reader will name the line.
    const delimiter = detectDelimiter(text);
    const first = lines.find((l) => l.trim() !== "") ?? "";
    const cells = cellsOf(first, delimiter);
    const decimalComma = delimiter !== "," && cells.some(looksLikeDecimalComma);
    const headerRow = isTextRow(cells, decimalComma);
    return { skipLines: 0, headerRow, unitRow: false, delimiter, decimalComma };
  }
  const { delimiter, decimalComma, width, firstData } = best;
  const textRowAbove = (index: number) => {
    const i = previousFilled(lines, index);
    if (i < 0) return -1;
    const cells = cellsOf(lines[i], delimiter);
    return cells.length === width &&
      !isNumericRow(cells, decimalComma) &&
      isTextRow(cells, decimalComma)
      ? i
      : -1;
  };
  const above = textRowAbove(firstData);
  if (above < 0) {
    return { skipLines: firstData, headerRow: false, unitRow: false, delimiter, decimalComma };
  }
  // A unit row sits under a header of the same width; most of its cells are units we know (an
  // unknown one such as "lbf" must still be read as a unit, so the reader can name it).
  const unitCells = cellsOf(lines[above], delimiter).filter(looksLikeUnitCell).length;
  const header = 2 * unitCells >= width ? textRowAbove(above) : -1;
  if (header >= 0) {
    return { skipLines: header, headerRow: true, unitRow: true, delimiter, decimalComma };
  }
  return { skipLines: above, headerRow: true, unitRow: false, delimiter, decimalComma };
}

/** Character offset just after the first `count` physical lines. */
export function offsetAfterLines(text: string, count: number): number {
  let offset = 0;
  for (let i = 0; i < count; i++) {
    const next = text.indexOf("\n", offset);
    if (next < 0) return text.length;
    offset = next + 1;
  }
  return offset;
}

/** "Force" under "kN" → "Force [kN]", so the header's unit rules read the unit row too. */
export function withUnit(header: string, unitCell: string | undefined): string {
  const unit = (unitCell ?? "").trim().replace(/^[[(]\s*(.*?)\s*[\])]$/, "$1");
  if (unit === "" || /[\])]\s*$/.test(header)) return header;
  return `${header} [${unit}]`;
}

/**
 * Test-curve CSV → numeric columns (struct of arrays) with the physical line of every row.
 * Pure string in, no DOM or Node APIs: it runs in a Web Worker. Limits are enforced before and
 * while parsing, and the first fatal problem stops the parse (a file with an error yields nothing).
 * A cell that is not a number is remembered per column rather than fatal here: a column of notes
 * is harmless until someone maps it (see extract-points.ts).
 */
import Papa from "papaparse";
import { csvError, type CsvError } from "./csv-error";
import { detectDelimiter, type Delimiter } from "./detect-delimiter";
import { offsetAfterLines, withUnit } from "./file-layout";
import {
  MAX_COLUMNS,
  MAX_DATA_ROWS,
  MAX_FILE_BYTES,
  MAX_HEADER_CELL_CHARS,
  utf8ByteLength,
} from "./limits";
import { looksLikeDecimalComma, parseNumberCell } from "./number-cell";

export interface BadCell {
  line: number;
  raw: string;
}

export interface CurveTable {
  headers: string[]; // from the header row, or "column 1", "column 2", …
  hasHeader: boolean;
  headerLine: number; // physical line of the header (or of the first data row without one)
  unitLine: number | null; // physical line of the unit row, if the file has one
  delimiter: Delimiter;
  decimalComma: boolean;
  rowCount: number;
  columns: Float64Array[]; // NaN where a cell is not a number
  lines: Int32Array; // 1-based physical line of each data row
  firstBadCell: (BadCell | null)[]; // per column
}

export type TableResult = { ok: true; table: CurveTable } | { ok: false; error: CsvError };

export interface ParseTableOptions {
  delimiter?: Delimiter; // detected when absent
  decimalComma?: boolean; // detected when absent
  skipLines?: number; // physical lines before the header (a machine's metadata block)
  headerRow?: boolean; // detected from the first row when absent
  unitRow?: boolean; // the row under the header holds the units
}

export function parseCurveTable(text: string, options: ParseTableOptions = {}): TableResult {
  if (text.length > MAX_FILE_BYTES || utf8ByteLength(text) > MAX_FILE_BYTES) {
    return fail(csvError("too-large", "The file is larger than 10 MB; split it or thin the rows."));
  }
  if (text.trim() === "") return fail(csvError("empty", "The file is empty."));
  const skipped = options.skipLines ?? 0;
  const body = text.slice(offsetAfterLines(text, skipped));
  if (body.trim() === "") {
    return fail(csvError("empty", `nothing after the ${skipped} skipped lines.`, skipped));
  }
  const delimiter = options.delimiter ?? detectDelimiter(body);
  const decimalComma = options.decimalComma ?? detectDecimalComma(body, delimiter);
  const builder = new TableBuilder(decimalComma, options.headerRow, options.unitRow ?? false);
  let error: CsvError | null = null;
  let newlines = skipped;
  let cursor = 0;
  Papa.parse<string[]>(body, {
    delimiter,
    step: (step, parser) => {
      const line = newlines + 1;
      const end = step.meta.cursor;
      for (let i = cursor; i < end; i++) if (body.charCodeAt(i) === 10) newlines++;
      cursor = end;
      const quoteError = step.errors.find((e) => e.type === "Quotes");
      error = quoteError
        ? csvError("quotes", 'a quoted cell is never closed properly (a lone ").', line)
        : builder.add(step.data, line);
      if (error) parser.abort();
    },
  });
  return error ? fail(error) : builder.finish(delimiter);
}

function fail(error: CsvError): TableResult {
  return { ok: false, error };
}

function detectDecimalComma(text: string, delimiter: Delimiter): boolean {
  if (delimiter === ",") return false;
  const sample = text.slice(0, 20_000).split("\n").slice(0, 50);
  return sample.some((line) => line.split(delimiter).some(looksLikeDecimalComma));
}

/** Collects rows; returns the first structural error (ragged row, too many rows or columns). */
class TableBuilder {
  private headers: string[] | null = null;
  private hasHeader = false;
  private values: number[][] = [];
  private lines: number[] = [];
  private firstBadCell: (BadCell | null)[] = [];
  private firstLine = 0;
  private unitLine: number | null = null;

  constructor(
    private readonly decimalComma: boolean,
    private readonly headerRow: boolean | undefined,
    private readonly unitRow: boolean,
  ) {}

  add(cells: string[], line: number): CsvError | null {
    if (cells.length === 1 && cells[0].trim() === "") return null; // blank line
    if (cells.length > MAX_COLUMNS) {
      const count = cells.length.toLocaleString("en-US");
      return csvError(
        "too-many-columns",
        `${count} cells; at most ${MAX_COLUMNS} columns are accepted.`,
        line,
      );
    }
    if (this.headers === null) return this.start(cells, line);
    if (this.unitRow && this.hasHeader && this.unitLine === null)
      return this.readUnits(cells, line);
    if (cells.length !== this.headers.length) {
      return csvError(
        "ragged",
        `${cells.length} cells where line ${this.firstLine} has ${this.headers.length}; every row needs the same columns.`,
        line,
      );
    }
    if (this.lines.length >= MAX_DATA_ROWS) {
      return csvError(
        "too-many-rows",
        `more than ${MAX_DATA_ROWS.toLocaleString("en-US")} data rows; thin the curve first.`,
        line,
      );
    }
    this.pushRow(cells, line);
    return null;
  }

  private start(cells: string[], line: number): CsvError | null {
    this.firstLine = line;
    if (cells.length < 2) {
      return csvError(
        "delimiter",
        'only one column found; separate columns with a comma, a semicolon or a tab, or raise "Lines to skip" past a block of notes above the table.',
        line,
      );
    }
    this.hasHeader =
      this.headerRow ?? cells.some((c) => parseNumberCell(c, this.decimalComma) === null);
    const longHeader = this.hasHeader
      ? cells.findIndex((c) => c.trim().length > MAX_HEADER_CELL_CHARS)
      : -1;
    if (longHeader >= 0) {
      const length = cells[longHeader].trim().length.toLocaleString("en-US");
      return csvError(
        "header-too-long",
        `the header of column ${longHeader + 1} is ${length} characters long; at most ${MAX_HEADER_CELL_CHARS} are accepted.`,
        line,
      );
    }
    this.headers = this.hasHeader
      ? cells.map((c, i) => c.trim() || `column ${i + 1}`)
      : cells.map((_, i) => `column ${i + 1}`);
    this.values = cells.map(() => []);
    this.firstBadCell = cells.map(() => null);
    if (!this.hasHeader) this.pushRow(cells, line);
    return null;
  }

  /** The unit row: each cell becomes the unit of the header above it ("Force" → "Force [kN]"). */
  private readUnits(cells: string[], line: number): CsvError | null {
    const headers = this.headers as string[];
    if (cells.length !== headers.length) {
      return csvError(
        "ragged",
        `the unit row has ${cells.length} cells where the header (line ${this.firstLine}) has ${headers.length}.`,
        line,
      );
    }
    this.unitLine = line;
    this.headers = headers.map((h, i) => withUnit(h, cells[i]));
    return null;
  }

  private pushRow(cells: string[], line: number) {
    this.lines.push(line);
    for (let j = 0; j < cells.length; j++) {
      const value = parseNumberCell(cells[j], this.decimalComma);
      if (value === null && this.firstBadCell[j] === null)
        this.firstBadCell[j] = { line, raw: cells[j] };
      this.values[j].push(value ?? Number.NaN);
    }
  }

  finish(delimiter: Delimiter): TableResult {
    if (this.headers === null) return fail(csvError("empty", "The file is empty."));
    if (this.lines.length === 0) {
      return fail(csvError("no-data", "a header but no data rows.", this.firstLine));
    }
    return {
      ok: true,
      table: {
        headers: this.headers,
        hasHeader: this.hasHeader,
        headerLine: this.firstLine,
        unitLine: this.unitLine,
        delimiter,
        decimalComma: this.decimalComma,
        rowCount: this.lines.length,
        columns: this.values.map((v) => Float64Array.from(v)),
        lines: Int32Array.from(this.lines),
        firstBadCell: this.firstBadCell,
      },
    };
  }
}

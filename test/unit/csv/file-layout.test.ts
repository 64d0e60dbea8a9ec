import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { detectLayout } from "@/lib/csv/file-layout";
import { parseCurveTable } from "@/lib/csv/parse-table";
import { readTable } from "@/lib/csv/read-record-csv";

// Issue 14 item 1: files as testing machines write them (fixtures invented, see their README).
const fixture = (name: string) =>
  readFileSync(path.join(process.cwd(), "test/fixtures/machine", name), "utf8");
const KN_PERCENT = fixture("tension-kn-percent.csv");
const N_MM = fixture("tension-n-mm.tsv");

describe("layout detection on machine-shaped files", () => {
  it("finds the metadata block, header, unit row, semicolons and decimal commas", () => {
    // Lines 1–8 are the comment, five metadata lines, "Nominal width;10,0" and a blank line.
    expect(detectLayout(KN_PERCENT)).toEqual({
      skipLines: 8,
      headerRow: true,
      unitRow: true,
      delimiter: ";",
      decimalComma: true,
    });
  });

  it("finds the metadata block, a header with its units in brackets and tabs", () => {
    expect(detectLayout(N_MM)).toEqual({
      skipLines: 5,
      headerRow: true,
      unitRow: false,
      delimiter: "\t",
      decimalComma: false,
    });
  });

  it("keeps a plain CSV as it was: nothing skipped, header on line 1", () => {
    expect(detectLayout("strain,stress\n0.001,10\n0.002,20\n")).toEqual({
      skipLines: 0,
      headerRow: true,
      unitRow: false,
      delimiter: ",",
      decimalComma: false,
    });
  });

  it("finds a file without a header", () => {
    const layout = detectLayout("0,001;10,5\n0,002;21\n");
    expect(layout).toMatchObject({ skipLines: 0, headerRow: false, decimalComma: true });
  });
});

describe("reading under the detected layout", () => {
  it("merges the unit row into the headers and numbers lines as in the file", () => {
    const out = readTable(KN_PERCENT);
    if (!out.ok) throw new Error(out.error.message);
    const { table, suggested } = out.read;
    expect(table.headers).toEqual(["Time [s]", "Force [kN]", "Extension [mm]", "Strain [%]"]);
    expect(table.headerLine).toBe(9);
    expect(table.unitLine).toBe(10);
    expect(table.lines[0]).toBe(11);
    expect(table.rowCount).toBe(8);
    expect(table.columns[1][3]).toBeCloseTo(1.25, 12); // "1,250" on line 14
    expect(suggested).toMatchObject({ time: 0, force: 1, extension: 2, strain: 3 });
  });

  it("reads the tab file's force and displacement columns", () => {
    const out = readTable(N_MM);
    if (!out.ok) throw new Error(out.error.message);
    expect(out.read.table.headers[2]).toBe("Displacement [mm]");
    expect(out.read.suggested).toMatchObject({ time: 0, force: 1, extension: 2 });
    expect(out.read.suggested.strain).toBeUndefined();
  });

  it("a changed choice wins over the detection", () => {
    const out = readTable(KN_PERCENT, { unitRow: false });
    if (!out.ok) throw new Error(out.error.message);
    // Without the unit row, line 10 ("s;kN;mm;%") is a data row and not a number.
    expect(out.read.table.firstBadCell[1]).toEqual({ line: 10, raw: "kN" });
  });

  it("says which line fails when the wrong lines are skipped", () => {
    const result = parseCurveTable(KN_PERCENT, { skipLines: 0, delimiter: ";" });
    expect(result.ok).toBe(false);
    if (!result.ok)
      expect(result.error.message).toMatch(/^line 1: only one column found.*"Lines to skip"/);
  });
});

describe("rows that are data although not every cell is a number", () => {
  it("a column of notes beside the numbers keeps the header on line 1", () => {
    expect(detectLayout("strain;stress;note\n0,001;10;a\n0,002;20;b\n")).toEqual({
      skipLines: 0,
      headerRow: true,
      unitRow: false,
      delimiter: ";",
      decimalComma: true,
    });
  });

  it("a file with no numbers at all is left as it is (the reader names the line)", () => {
    expect(detectLayout("a;b\nc;d\n")).toMatchObject({
      skipLines: 0,
      delimiter: ";",
      headerRow: true,
    });
  });
});

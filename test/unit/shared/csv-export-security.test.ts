/**
 * Issue 12 item 4: a set id written raw into an export could run as a spreadsheet formula or shift
 * the columns. Every export is parsed back with papaparse (the project's CSV parser, lib/csv).
 */
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { differencesCsv } from "@/lib/server/handoff/conformance/differences-csv";
import type { History } from "@/lib/server/handoff/conformance/read-history";
import type { ConformanceResult } from "@/lib/server/handoff/conformance/types";
import { RESULT_COLUMNS, type ResultColumns } from "@/lib/mechanics/types";
import { csvCell, csvRow } from "@/lib/shared/csv-writer";
import { STUDY_SUMMARY_HEADER, studySummaryCsv } from "@/lib/shared/study-summary-csv";
import { allSetsCsv } from "@/lib/client/loading-desk/csv-export";
import { ResultBuffer } from "@/lib/client/loading-desk/result-buffer";

const FORMULA = "=cmd|' /C calc'!A0";
const COMMA = "set, with a comma";

function parse(text: string): string[][] {
  const out = Papa.parse<string[]>(text, { skipEmptyLines: true });
  expect(out.errors).toEqual([]);
  return out.data;
}

function summaryOf(id: string): string {
  return studySummaryCsv([
    {
      position: 0,
      set: { id, label: `label "quoted", ${id}` },
      state: "done",
      status: { failed: false, failMode: null, stoppedAtIncrement: null },
      error: null,
    },
  ]);
}

function conformanceOf(setId: string): string {
  const result: ConformanceResult = {
    setId,
    tolerance: { stressFraction: 0.01, damage: 0.005 },
    points: 2,
    peakStress: 100,
    quantities: [
      {
        quantity: "sig11",
        tolerance: 1,
        maxAbs: 0.5,
        rms: 0.25,
        maxRel: 0.01,
        firstFailIncrement: null,
        passed: true,
      },
    ],
    passed: true,
    firstFailIncrement: null,
  };
  const history: History = {
    rows: 2,
    lines: Int32Array.from([2, 3]),
    sig11: Float64Array.from([0, -50]),
  };
  const columns = Object.fromEntries(
    RESULT_COLUMNS.map((c) => [c, Float64Array.from([0, -49.5])]),
  ) as unknown as ResultColumns;
  return differencesCsv(result, history, columns, Int32Array.from([0, 1]));
}

describe("security: formula injection and broken quoting in exported CSVs", () => {
  it("study summary: a formula set id opens as text and every line keeps the header's columns", () => {
    for (const id of [FORMULA, COMMA]) {
      const rows = parse(summaryOf(id));
      expect(rows[0]).toEqual([...STUDY_SUMMARY_HEADER]);
      expect(rows[1]).toHaveLength(STUDY_SUMMARY_HEADER.length);
      expect(rows[1][0]).toBe("1");
      expect(rows[1][1]).toBe(id.startsWith("=") ? `'${id}` : id);
      expect(rows[1][2]).toBe(`label "quoted", ${id}`);
    }
  });

  it("conformance CSV: the first line is one cell whatever the set id holds", () => {
    for (const id of [FORMULA, COMMA]) {
      const rows = parse(conformanceOf(id));
      expect(rows[0]).toEqual([`# Craquelure conformance check, parameter set ${id}: PASS`]);
      const header = rows.findIndex((r) => r[0] === "increment");
      expect(rows[header]).toHaveLength(4);
      for (const data of rows.slice(header + 1)) expect(data).toHaveLength(4);
      // Numbers stay numbers: a negative stress is not prefixed.
      expect(rows[header + 2]).toEqual(["1", "-50", "-49.5", "-0.5"]);
    }
  });

  it("loading desk all-sets CSV: the set column holds the whole id, neutralised", () => {
    const b = new ResultBuffer(2);
    for (const c of RESULT_COLUMNS) b.columns[c][0] = c === "sig11" ? -1 : 0;
    b.rows = 1;
    for (const id of [FORMULA, COMMA]) {
      const rows = parse(allSetsCsv([{ id, buffer: b }]));
      expect(rows[1]).toHaveLength(RESULT_COLUMNS.length + 1);
      expect(rows[1][0]).toBe(id.startsWith("=") ? `'${id}` : id);
      expect(rows[1][1 + RESULT_COLUMNS.indexOf("sig11")]).toBe("-1");
    }
  });

  it("writer: RFC 4180 quoting and the formula prefix on text only", () => {
    expect(csvRow(["a,b", 'say "hi"', "two\nlines", "cr\rhere"])).toBe(
      '"a,b","say ""hi""","two\nlines","cr\rhere"',
    );
    for (const start of ["=", "+", "-", "@", "\t"]) expect(csvCell(`${start}1`)).toBe(`'${start}1`);
    expect(csvCell("\r1")).toBe(`"'\r1"`);
    expect(csvCell(-1)).toBe("-1");
    expect(csvCell(-0)).toBe("0");
    expect(csvCell(1e-7)).toBe("1e-7");
    expect(csvCell(null)).toBe("");
  });
});

/**
 * The loading desk's results CSV (issue 15 item 3): one header line with units, numbers to
 * EXPORT_SIGNIFICANT_DIGITS, read back by the project's own reader (lib/csv) with the units
 * recognised from the header and values equal to the core's (lib/mechanics runPath) to those digits.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { RESULT_COLUMNS } from "@/lib/mechanics/types";
import { runPath } from "@/lib/mechanics/driver";
import { readCurveCsv } from "@/lib/csv/read-curve-csv";
import { strainUnitFromHeader, stressUnitFromHeader } from "@/lib/csv/units";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { CSV_HEADER } from "@/lib/scenario/results-csv";
import { allSetsCsv, EXPORT_HEADER, setCsv } from "@/lib/client/loading-desk/csv-export";
import {
  EXPORT_HEADINGS,
  EXPORT_SIGNIFICANT_DIGITS,
  exportNumber,
} from "@/lib/client/loading-desk/export-columns";
import { ResultBuffer } from "@/lib/client/loading-desk/result-buffer";

function buffer(rows: number, scale: number) {
  const b = new ResultBuffer(rows + 3);
  for (const c of RESULT_COLUMNS)
    for (let i = 0; i < rows; i++) b.columns[c][i] = c === "increment" ? i : i * scale;
  b.rows = rows;
  return b;
}

function coreRun() {
  const json: unknown = JSON.parse(
    readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
  );
  const parsed = parseScenarioFile(json);
  if (!parsed.ok) throw new Error(parsed.errors.join("; "));
  const set = parsed.scenario.parameterSets[0];
  const run = runPath(toMaterialParams(set), parsed.scenario.path.legs);
  const b = new ResultBuffer(run.rows);
  for (const c of RESULT_COLUMNS) b.columns[c].set(run.columns[c].subarray(0, run.rows));
  b.rows = run.rows;
  return b;
}

/** Rounding to n significant digits moves a value by at most half a unit of its n-th digit. */
function closeToDigits(read: number, core: number): boolean {
  return Math.abs(read - core) <= 0.5 * 10 ** (1 - EXPORT_SIGNIFICANT_DIGITS) * Math.abs(core);
}

describe("loading desk results CSV", () => {
  it("has one header line with the symbols and units, and only the filled rows", () => {
    const lines = setCsv(buffer(3, 0.5)).trimEnd().split("\n");
    expect(lines[0]).toBe(EXPORT_HEADER);
    expect(lines[0].split(",").slice(0, 8)).toEqual([
      "increment",
      "leg",
      "ε11 [-]",
      "ε22 [-]",
      "γ12 [-]",
      "σ11 [MPa]",
      "σ22 [MPa]",
      "σ12 [MPa]",
    ]);
    expect(lines[0]).toContain("Φ [MPa]");
    expect(lines[0]).toContain("θd [deg]");
    expect(lines).toHaveLength(4);
    expect(lines[3].split(",")[5]).toBe("1");
  });

  it("leaves the command line's contract header as it is", () => {
    expect(CSV_HEADER).toBe(RESULT_COLUMNS.join(","));
    expect(EXPORT_HEADER).not.toBe(CSV_HEADER);
  });

  it("writes numbers to the stated digits without float noise", () => {
    expect(exportNumber(0.1 * 3 * 0.0001)).toBe("0.00003");
    expect(exportNumber(0.000030000000000000004)).toBe("0.00003");
    expect(exportNumber(0.1 + 0.2)).toBe("0.3");
    expect(exportNumber(123.456789012345)).toBe("123.456789");
    expect(exportNumber(-1.23456789012345e-7)).toBe("-1.23456789e-7");
    expect(exportNumber(250)).toBe("250");
    expect(exportNumber(-0)).toBe("0");
  });

  it("is read back by lib/csv with the units from the header and the core's values to the digits", () => {
    const core = coreRun();
    expect(core.rows).toBeGreaterThan(10);
    // With the byte-order mark the download starts with, so spreadsheets take it as UTF-8.
    const read = readCurveCsv("\uFEFF" + setCsv(core));
    if (!read.ok) throw new Error(read.error.message);
    const headers = read.table.headers;
    expect(read.suggested.strain).toBe(headers.indexOf(EXPORT_HEADINGS.eps11));
    expect(read.suggested.stress).toBe(headers.indexOf(EXPORT_HEADINGS.sig11));
    expect(read.suggested.transverseStrain).toBe(headers.indexOf(EXPORT_HEADINGS.eps22));
    expect(read.suggested.shearStrain).toBe(headers.indexOf(EXPORT_HEADINGS.gam12));
    expect(read.suggested.shearStress).toBe(headers.indexOf(EXPORT_HEADINGS.sig12));
    for (const c of ["eps11", "eps22", "gam12"] as const)
      expect(strainUnitFromHeader(EXPORT_HEADINGS[c])).toBe("mm/mm");
    for (const c of ["sig11", "sig22", "sig12"] as const)
      expect(stressUnitFromHeader(EXPORT_HEADINGS[c])).toBe("MPa");
    expect(read.points.strainUnit).toBe("mm/mm");
    expect(read.points.stressUnit).toBe("MPa");
    expect(read.points.strain.length).toBe(core.rows);
    let differs = 0;
    for (let i = 0; i < core.rows; i++) {
      const eps = core.columns.eps11[i];
      const sig = core.columns.sig11[i];
      expect(closeToDigits(read.points.strain[i], eps), `ε11 row ${i}`).toBe(true);
      expect(closeToDigits(read.points.stress[i], sig), `σ11 row ${i}`).toBe(true);
      expect(closeToDigits(read.points.transverseStrain![i], core.columns.eps22[i])).toBe(true);
      if (read.points.stress[i] !== sig) differs++;
    }
    // The rounding really happened (else this test would not see a lost digit).
    expect(differs).toBeGreaterThan(0);
  });

  it("writes all sets with a leading set column", () => {
    const lines = allSetsCsv([
      { id: "A", buffer: buffer(2, 1) },
      { id: "B", buffer: buffer(3, 2) },
    ])
      .trimEnd()
      .split("\n");
    expect(lines[0]).toBe(`set,${EXPORT_HEADER}`);
    expect(lines.slice(1).map((l) => l.split(",")[0])).toEqual(["A", "A", "B", "B", "B"]);
  });
});

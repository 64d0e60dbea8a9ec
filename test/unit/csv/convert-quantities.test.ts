import { readFileSync } from "node:fs";
import path from "node:path";

import { describe, expect, it } from "vitest";

import { readRecordCsv } from "@/lib/csv/read-record-csv";
import { strainFromExtension, stressFromForce } from "@/lib/csv/convert-quantities";

// Issue 14 item 1: force/extension → engineering stress and strain. Every expected value below is
// computed by hand from the fixture's cells and the geometry (σ = F/(w·t), ε = ΔL/L0).
const fixture = (name: string) =>
  readFileSync(path.join(process.cwd(), "test/fixtures/machine", name), "utf8");
const KN_PERCENT = fixture("tension-kn-percent.csv");
const N_MM = fixture("tension-n-mm.tsv");

function read(text: string, mapping: Parameters<typeof readRecordCsv>[1]) {
  const out = readRecordCsv(text, mapping);
  if (!out.ok) throw new Error(out.error.message);
  return out;
}

describe("the formulas", () => {
  it("σ = F/(w·t): F = 1250 N, w = 10 mm, t = 4 mm → 1250/40 = 31.25 MPa", () => {
    expect(stressFromForce(1250, 10, 4)).toBe(31.25);
  });
  it("ε = ΔL/L0: ΔL = 0.1875 mm, L0 = 50 mm → 0.00375 mm/mm", () => {
    expect(strainFromExtension(0.1875, 50)).toBeCloseTo(0.00375, 15);
  });
});

describe("the kN / % file (semicolons, decimal commas, unit row)", () => {
  const geometry = { widthMm: 10, thicknessMm: 4, gaugeLengthMm: 50 };

  it("force in kN becomes stress in MPa, the % extensometer column becomes mm/mm", () => {
    const out = read(KN_PERCENT, { force: 1, strain: 3, geometry });
    // Line 14 "3,0;1,250;0,1875;0,375": F = 1.25 kN = 1250 N, A = 10·4 = 40 mm² → 31.25 MPa;
    // strain 0.375 % → 0.00375 mm/mm.
    expect(out.points.stress[3]).toBeCloseTo(31.25, 12);
    expect(out.points.strain[3]).toBeCloseTo(0.00375, 15);
    // Line 16 "5,0;1,500;…": 1500/40 = 37.5 MPa.
    expect(out.points.stress[5]).toBeCloseTo(37.5, 12);
    expect(Array.from(out.points.lines.slice(0, 2))).toEqual([11, 12]);
    expect(out.conversion).toEqual({ forceColumn: "Force [kN]", forceUnit: "kN" });
  });

  it("extension in mm becomes strain with the gauge length, matching the extensometer", () => {
    const out = read(KN_PERCENT, { force: 1, extension: 2, geometry });
    // Line 12: ΔL = 0.0625 mm, L0 = 50 mm → 0.00125 (the file's strain column says 0.125 %).
    expect(out.points.strain[1]).toBeCloseTo(0.00125, 15);
    expect(out.points.stress[1]).toBeCloseTo(12.5, 12); // 500 N / 40 mm²
    expect(out.conversion.extensionColumn).toBe("Extension [mm]");
  });

  it("a chosen unit wins over the unit row: force read as N gives 1.25/40", () => {
    const out = read(KN_PERCENT, { force: 1, strain: 3, forceUnit: "N", geometry });
    expect(out.points.stress[3]).toBeCloseTo(0.03125, 15);
  });
});

describe("the N / mm file (tabs)", () => {
  it("F = 700 N, w = 12.5 mm, t = 2 mm → 700/25 = 28 MPa; ΔL = 0.030 mm, L0 = 25 mm → 0.0012", () => {
    const out = read(N_MM, {
      force: 1,
      extension: 2,
      geometry: { widthMm: 12.5, thicknessMm: 2, gaugeLengthMm: 25 },
    });
    expect(out.points.stress[3]).toBeCloseTo(28, 12);
    expect(out.points.strain[3]).toBeCloseTo(0.0012, 15);
    expect(out.points.stress.length).toBe(6);
  });
});

describe("what is missing, in words", () => {
  const missing = (mapping: Parameters<typeof readRecordCsv>[1]) => {
    const out = readRecordCsv(KN_PERCENT, mapping);
    if (out.ok) throw new Error("expected a missing input");
    return out.missing;
  };
  it("names the thickness, the width and the gauge length", () => {
    expect(missing({ force: 1, strain: 3, geometry: { widthMm: 10 } })).toBe(
      "Give the specimen's thickness in mm to convert force to stress.",
    );
    expect(missing({ force: 1, strain: 3 })).toBe(
      "Give the specimen's width in mm to convert force to stress.",
    );
    expect(missing({ force: 1, extension: 2, geometry: { widthMm: 10, thicknessMm: 4 } })).toBe(
      "Give the gauge length in mm to convert extension to strain.",
    );
  });

  it("refuses a geometry of 0 mm by its label", () => {
    const out = readRecordCsv(KN_PERCENT, {
      force: 1,
      strain: 3,
      geometry: { widthMm: 10, thicknessMm: 0 },
    });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.error.message).toBe("The specimen's thickness must be more than 0 mm.");
  });

  it("an unknown force unit in the unit row names the line and the column", () => {
    const text = KN_PERCENT.replace("s;kN;mm;%", "s;lbf;mm;%");
    const out = readRecordCsv(text, {
      force: 1,
      strain: 3,
      geometry: { widthMm: 10, thicknessMm: 4 },
    });
    expect(out.ok).toBe(false);
    if (!out.ok)
      expect(out.error.message).toBe(
        'line 9, column "Force [lbf]": unit "lbf" is not one of N, kN; choose the force unit in the mapping step.',
      );
  });
});

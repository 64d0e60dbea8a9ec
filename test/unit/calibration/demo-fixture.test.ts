/**
 * The invented demo CSV in test/fixtures/calibration is exactly what demo-curves.ts generates
 * (seed 42, uniform noise ±0.05 MPa / ±5e-6, spec A.3 demo set), and reading plus identifying it
 * gives the generating values within the spec D.18 tolerances.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { DEMO_PARAMS, demoCyclicTension } from "@/lib/calibration/demo-curves";
import { demoCsvText, DEMO_CSV_OPTIONS } from "@/lib/calibration/demo-csv";
import { identify } from "@/lib/calibration/identify";
import { readCurveCsv } from "@/lib/csv/read-curve-csv";

const file = path.resolve(__dirname, "../../fixtures/calibration/demo-cyclic-tension.csv");
const rel = (x: number, ref: number) => Math.abs(x / ref - 1);

describe("invented demo CSV", () => {
  const text = readFileSync(file, "utf8");
  it("matches the generator", () => {
    expect(text).toBe(demoCsvText());
  });
  it("reads, maps and identifies within 3 % / 10 % / 3 % (spec D.18)", () => {
    const read = readCurveCsv(text);
    if (!read.ok) throw new Error(read.error.message);
    expect(read.suggested).toEqual({ strain: 0, stress: 1, transverseStrain: 2 });
    const points = demoCyclicTension(DEMO_PARAMS, DEMO_CSV_OPTIONS);
    expect(read.points.stress.length).toBe(points.stress.length);
    const result = identify([{ id: "demo", testType: "tension-1", points: read.points }], {
      base: DEMO_PARAMS,
    });
    expect(rel(result.params.a1, 0.6)).toBeLessThan(0.03);
    expect(rel(result.params.Y0_1, 0.05)).toBeLessThan(0.1);
    expect(rel(result.params.alpha, 0.005)).toBeLessThan(0.03);
  });
});

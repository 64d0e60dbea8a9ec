import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { readCurveCsv } from "@/lib/csv/read-curve-csv";

function ok(text: string, mapping?: Parameters<typeof readCurveCsv>[1]) {
  const result = readCurveCsv(text, mapping);
  if (!result.ok) throw new Error(`expected success, got: ${result.error.message}`);
  return result;
}

describe("delimiters, decimal commas and header rows", () => {
  it("reads a comma file with a header and units in brackets", () => {
    const r = ok("strain [%],stress (MPa)\n0.1,10\n0.2,20\n");
    expect(r.table.delimiter).toBe(",");
    expect(Array.from(r.points.strain)).toEqual([0.001, 0.002]);
    expect(Array.from(r.points.stress)).toEqual([10, 20]);
    expect(r.points.strainUnit).toBe("percent");
    expect(r.warnings).toEqual([]); // the unit was written, not guessed
  });

  it("reads semicolons with decimal commas", () => {
    const r = ok("Strain;Stress\n0,0123;45,6\n0,0150;50,25\n");
    expect(r.table.delimiter).toBe(";");
    expect(r.table.decimalComma).toBe(true);
    expect(Array.from(r.points.strain)).toEqual([0.0123, 0.015]);
    expect(Array.from(r.points.stress)).toEqual([45.6, 50.25]);
  });

  it("reads tabs, CRLF line ends and no header (strain, stress order)", () => {
    const r = ok("0.001\t11\r\n0.002\t22\r\n");
    expect(r.table.delimiter).toBe("\t");
    expect(r.table.hasHeader).toBe(false);
    expect(r.table.headers).toEqual(["column 1", "column 2"]);
    expect(Array.from(r.points.stress)).toEqual([11, 22]);
    expect(Array.from(r.points.lines)).toEqual([1, 2]);
  });

  it("converts kPa named in the header and a Force/Area column", () => {
    const r = ok("time (s),Force/Area [kPa],strain [mm/mm]\n0,1000,0.001\n1,2000,0.002\n");
    expect(r.suggested).toMatchObject({ time: 0, stress: 1, strain: 2 });
    expect(Array.from(r.points.stress)).toEqual([1, 2]);
    expect(r.points.stressUnit).toBe("kPa");
  });

  it("suggests transverse and shear channels by name", () => {
    const r = ok(
      "axial strain,transverse strain,stress [GPa],shear strain,shear stress [MPa]\n0,0,0,0,0\n",
    );
    expect(r.suggested).toEqual({
      strain: 0,
      transverseStrain: 1,
      stress: 2,
      shearStrain: 3,
      shearStress: 4,
    });
  });

  it("detects percent strain and Pa stress by magnitude and warns (spec E.1)", () => {
    const r = ok("strain,stress\n0.5,2000000\n1.0,4000000\n");
    expect(Array.from(r.points.strain)).toEqual([0.005, 0.01]);
    expect(Array.from(r.points.stress)).toEqual([2, 4]);
    expect(r.warnings).toHaveLength(2);
    expect(r.warnings[0]).toMatch(/percent/);
    expect(r.warnings[1]).toMatch(/Pa/);
  });

  it("takes the user's unit over detection", () => {
    const r = ok("strain,stress\n0.5,20\n", {
      strain: 0,
      stress: 1,
      strainUnit: "mm/mm",
      stressUnit: "GPa",
    });
    expect(Array.from(r.points.strain)).toEqual([0.5]);
    expect(Array.from(r.points.stress)).toEqual([20000]);
    expect(r.warnings).toEqual([]);
  });

  it("ignores an unmapped text column but rejects it once mapped", () => {
    const text = "strain,stress,note\n0.001,10,start\n0.002,20,ok\n";
    expect(ok(text).points.stress.length).toBe(2);
    const bad = readCurveCsv(text, { strain: 0, stress: 2 });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.error.message).toBe('line 2, column "note": "start" is not a number');
  });

  it("keeps NaN drop-outs as non-finite values for cleaning to drop", () => {
    const r = ok("strain,stress\n0.001,NaN\n0.002,20\n");
    expect(Number.isNaN(r.points.stress[0])).toBe(true);
  });

  it("round-trips any numbers in any delimiter and decimal style (property)", () => {
    const value = fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true });
    const rows = fc.array(fc.tuple(value, value), { minLength: 1, maxLength: 30 });
    const style = fc.constantFrom(
      { sep: ",", comma: false },
      { sep: ";", comma: false },
      { sep: ";", comma: true },
      { sep: "\t", comma: true },
    );
    fc.assert(
      fc.property(rows, style, (data, { sep, comma }) => {
        const fmt = (v: number) => (comma ? String(v).replace(".", ",") : String(v));
        const body = data.map(([e, s]) => `${fmt(e)}${sep}${fmt(s)}`).join("\n");
        const r = readCurveCsv(`strain [mm/mm]${sep}stress [MPa]\n${body}\n`);
        expect(r.ok).toBe(true);
        if (r.ok) {
          expect(Array.from(r.points.strain)).toEqual(data.map((d) => d[0] + 0));
          expect(Array.from(r.points.stress)).toEqual(data.map((d) => d[1] + 0));
        }
      }),
      { numRuns: 200 },
    );
  });
});

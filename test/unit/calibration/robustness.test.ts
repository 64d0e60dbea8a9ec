/** Odd input never throws: identification reports instead (property tests with fast-check). */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEMO_PARAMS, demoCyclicTension } from "@/lib/calibration/demo-curves";
import { identify } from "@/lib/calibration/identify";
import { recordPointsFor } from "@/lib/calibration/record-points";
import { TEST_TYPES } from "@/lib/csv/record-schema";
import { checkParams } from "@/lib/mechanics/validate";

describe("identify on arbitrary curves", () => {
  it("returns a result for any finite or non-finite samples and any test type", () => {
    const sample = fc.oneof(
      fc.double({ min: -1e3, max: 1e3 }),
      fc.constant(Number.NaN),
      fc.constant(0),
    );
    fc.assert(
      fc.property(
        fc.array(fc.tuple(sample, sample), { maxLength: 60 }),
        fc.constantFrom(...TEST_TYPES),
        (rows, testType) => {
          const points = {
            strain: Float64Array.from(rows, (r) => r[0] / 1e4),
            stress: Float64Array.from(rows, (r) => r[1]),
          };
          const result = identify([{ id: "x", testType, points }], { base: DEMO_PARAMS });
          const q = result.params;
          // without a tension-2 record the set is in-plane isotropic: axis 2 copies axis 1
          const isotropic = testType !== "tension-2";
          const copied = isotropic ? ["E2", "Y0_2", "a2", "beta", "G12"] : [];
          if (isotropic) {
            expect([q.E2, q.Y0_2, q.a2, q.beta]).toEqual([q.E1, q.Y0_1, q.a1, q.alpha]);
            expect(q.G12).toBeCloseTo(q.E1 / (2 * (1 + q.nu12)), 9);
          }
          // every value the records gave is finite; the rest stay the base set's
          for (const [key, value] of Object.entries(q)) {
            const k = key as keyof typeof DEMO_PARAMS;
            if (result.identified.includes(k)) expect(Number.isFinite(value)).toBe(true);
            else if (!copied.includes(k)) expect(value).toBe(DEMO_PARAMS[k]);
          }
          // an inadmissible set is never replayed, and the notes say which field is off
          const problems = checkParams(result.params);
          if (problems.length > 0) {
            expect(result.notes.join(" ")).toContain(problems[0]);
            expect(result.records[0].validation).toBeNull();
          }
        },
      ),
      { numRuns: 150 },
    );
  });

  it("does not replay an inadmissible identified set and says why", () => {
    // Residual strains far beyond the admissible alpha ≤ 0.05.
    const points = demoCyclicTension();
    const strain = points.strain.map((e, i) => e + (i >= 120 ? 0.01 * Math.floor(i / 120) : 0));
    const result = identify([{ id: "odd", testType: "tension-1", points: { ...points, strain } }], {
      base: DEMO_PARAMS,
    });
    expect(result.notes.join(" ")).toMatch(/no replay validation: .*alpha/);
    expect(result.records[0].validation).toBeNull();
  });
});

describe("modulus choice under hysteresis (spec E.3)", () => {
  it("the chord replaces the unloading fit only where loops show hysteresis", () => {
    const points = demoCyclicTension();
    // Stiffer reloading, and unloading branches bowed by up to 3 MPa so the tip-to-tip chord
    // differs from the least-squares unloading slope.
    const stress = points.stress.map((s, i) => {
      const j = i % 120;
      if (i > 120 && j > 0 && j <= 30) return s * 1.2;
      return j > 60 ? s + 3 * Math.sin((Math.PI * (j - 60)) / 60) : s;
    });
    const record = { id: "h", testType: "tension-1" as const, points: { ...points, stress } };
    const unloading = identify([record], { base: DEMO_PARAMS });
    const chord = identify([record], { base: DEMO_PARAMS, modulus: "chord" });
    const u = unloading.records[0].loops;
    const c = chord.records[0].loops;
    const hyst = u.findIndex((l) => l.hysteresis);
    expect(hyst).toBeGreaterThanOrEqual(0);
    expect(c[hyst].E).toBeCloseTo(u[hyst].chordE!, 9);
    const last = u.length - 1; // nothing reloads after the last loop: no hysteresis there
    expect(u[last].hysteresis).toBe(false);
    expect(c[last].E).toBe(u[last].E);
    expect(Math.abs(c[hyst].E / u[hyst].E - 1)).toBeGreaterThan(0.01);
  });
});

describe("points per test type", () => {
  it("shear uses the mapped shear channels", () => {
    const curve = {
      strain: Float64Array.of(1),
      stress: Float64Array.of(2),
      shearStrain: Float64Array.of(3),
      shearStress: Float64Array.of(4),
      lines: Int32Array.of(2),
      strainUnit: "mm/mm" as const,
      stressUnit: "MPa" as const,
    };
    expect(recordPointsFor("shear-12", curve).stress[0]).toBe(4);
    expect(recordPointsFor("tension-1", curve).stress[0]).toBe(2);
  });
});

/**
 * Spec D.18: identification round trip on the driver's output for cyclic tension, peaks
 * 0.002 … 0.014, unloading to σ = 0 each time, 60 + 60 increments per cycle, demo set of A.3.
 */
import { describe, expect, it } from "vitest";
import { D18_PEAKS, DEMO_PARAMS, demoCyclicTension } from "@/lib/calibration/demo-curves";
import { identifyAxis } from "@/lib/calibration/identify-axis";
import { cyclicRecord } from "./driver-records";

const rel = (x: number, ref: number) => Math.abs(x / ref - 1);

describe("spec D.18 round trip", () => {
  const points = cyclicRecord(DEMO_PARAMS, "tension-1", D18_PEAKS);

  it("the invented demo curve equals the driver's output (spec D.4, D.5, D.8)", () => {
    const demo = demoCyclicTension();
    expect(demo.strain.length).toBe(points.strain.length);
    for (let i = 0; i < points.strain.length; i++) {
      expect(Math.abs(demo.strain[i] - points.strain[i])).toBeLessThan(1e-12);
      expect(Math.abs(demo.stress[i] - points.stress[i])).toBeLessThan(1e-8);
    }
  });

  it("loop table follows D.4 at every peak; the first loop is undamaged", () => {
    const { loops, E0 } = identifyAxis({ id: "d18", testType: "tension-1", points });
    expect(loops).toHaveLength(7);
    expect(E0?.E0).toBeCloseTo(11000, 6);
    expect(loops[0].d).toBeLessThan(1e-9);
    // spec D.4 table: (ε11, d1, σ11)
    const table: [number, number, number][] = [
      [0.004, 0.03584882, 40.52165],
      [0.006, 0.1086467, 53.50297],
      [0.008, 0.1814446, 63.86414],
      [0.01, 0.2542425, 71.60515],
      [0.012, 0.3270403, 76.726],
    ];
    table.forEach(([eps, d, sig], i) => {
      const loop = loops[i + 1];
      expect(loop.epsMax).toBeCloseTo(eps, 12);
      expect(rel(loop.sigMax, sig)).toBeLessThan(1e-6);
      expect(rel(loop.d, d)).toBeLessThan(1e-6);
      expect(rel(loop.E, 11000 * (1 - d))).toBeLessThan(1e-6);
      expect(rel(loop.epsR, 0.005 * d)).toBeLessThan(1e-6); // εr = alpha·d
    });
  });

  it("returns a = 0.600000, Y0 = 0.0500000, alpha = 0.00500000 without noise", () => {
    const { threshold, frozen, warnings } = identifyAxis({
      id: "d18",
      testType: "tension-1",
      points,
    });
    expect(rel(threshold!.a, 0.6)).toBeLessThan(1e-6);
    expect(rel(threshold!.Y0, 0.05)).toBeLessThan(1e-6);
    expect(rel(frozen!.alpha, 0.005)).toBeLessThan(1e-6);
    expect(threshold!.envelopeOk).toBe(true);
    expect(warnings).toEqual([]);
  });

  it.each([1, 2, 3, 4, 5])(
    "with uniform noise ±0.05 MPa / ±5e-6 (seed %i): a 3 %, Y0 10 %, alpha 3 %",
    (seed) => {
      const noisy = cyclicRecord(DEMO_PARAMS, "tension-1", D18_PEAKS, {
        noiseStress: 0.05,
        noiseStrain: 5e-6,
        seed,
      });
      const { threshold, frozen } = identifyAxis({
        id: "noisy",
        testType: "tension-1",
        points: noisy,
      });
      expect(rel(threshold!.a, 0.6)).toBeLessThan(0.03);
      expect(rel(threshold!.Y0, 0.05)).toBeLessThan(0.1);
      expect(rel(frozen!.alpha, 0.005)).toBeLessThan(0.03);
    },
  );

  it("the 'linY' option recovers a linear-in-Y law from its own driver output", () => {
    const linY = { ...DEMO_PARAMS, law: "linY" as const, a1: 0.3, a2: 0.3 };
    const data = cyclicRecord(linY, "tension-1", D18_PEAKS);
    const { threshold } = identifyAxis({ id: "lin", testType: "tension-1", points: data }, "linY");
    expect(rel(threshold!.a, 0.3)).toBeLessThan(1e-6);
    expect(rel(threshold!.Y0, 0.05)).toBeLessThan(1e-6);
    expect(threshold!.envelopeOk).toBe(true); // 2·a·Y0 = 0.03 < 1
  });
});

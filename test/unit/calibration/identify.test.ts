/** identify(): spec E end to end on model output and on deliberately flawed curves. */
import { describe, expect, it } from "vitest";
import { D18_PEAKS, DEMO_PARAMS, demoCyclicTension } from "@/lib/calibration/demo-curves";
import { identify } from "@/lib/calibration/identify";
import type { RecordPoints } from "@/lib/calibration/types";
import { runPath } from "@/lib/mechanics/driver";
import type { Leg } from "@/lib/mechanics/types";
import { cyclicRecord } from "./driver-records";

const rel = (x: number, ref: number) => Math.abs(x / ref - 1);
// A start far from the answer: identify must not lean on it for what the records inform.
const base = {
  ...DEMO_PARAMS,
  E1: 8000,
  E2: 8000,
  a1: 0.2,
  a2: 0.2,
  Y0_1: 0.2,
  Y0_2: 0.2,
  alpha: 0.01,
  beta: 0.01,
  b: 0.8,
  k6: 2.5,
  nu12: 0.2,
};

function strainLegs(path: [("e" | "s")[], [number, number, number]][], n = 60): Leg[] {
  return path.map(([c, target]) => ({
    control: c.map((k) => (k === "e" ? "strain" : "stress")) as Leg["control"],
    target,
    increments: n,
  }));
}

describe("identify on a 2,000-point noisy record (invented demo curve)", () => {
  const points = demoCyclicTension(DEMO_PARAMS, {
    increments: 143,
    noiseStress: 0.05,
    noiseStrain: 5e-6,
    seed: 11,
  });
  const result = identify([{ id: "demo", testType: "tension-1", points }], { base });

  it("has 2,003 points, 7 loops, and recovers the generating values", () => {
    expect(points.strain.length).toBe(2003);
    expect(result.records[0].loops).toHaveLength(7);
    expect(rel(result.params.E1, 11000)).toBeLessThan(0.01);
    expect(rel(result.params.a1, 0.6)).toBeLessThan(0.03);
    expect(rel(result.params.Y0_1, 0.05)).toBeLessThan(0.1);
    expect(rel(result.params.alpha, 0.005)).toBeLessThan(0.03);
    expect(rel(result.params.nu12, 0.3)).toBeLessThan(0.03); // spec E.7, from the transverse strain
    expect(result.warnings).toEqual([]);
  });

  it("copies axis 1 to axis 2 for an in-plane isotropic material and says so", () => {
    expect(result.params.E2).toBe(result.params.E1);
    expect(result.params.beta).toBe(result.params.alpha);
    expect(result.params.G12).toBeCloseTo(result.params.E1 / (2 * (1 + result.params.nu12)), 9);
    expect(result.notes.join(" ")).toMatch(/isotropic/);
  });

  it("validates by replay: RMS stress error at the noise level, small peak and loop-modulus errors", () => {
    const v = result.records[0].validation!;
    expect(v.rms).toBeLessThan(0.3); // uniform ±0.05 MPa has RMS 0.029 MPa
    expect(Math.abs(v.peakError)).toBeLessThan(1);
    expect(Math.max(...v.loopModulusError.map(Math.abs))).toBeLessThan(0.02);
  });

  it("reports dcrit from the last loop as a lower bound when nothing ruptured", () => {
    expect(result.params.dcrit).toBeCloseTo(0.3998, 2);
    expect(result.notes.join(" ")).toMatch(/lower bound/);
  });
});

describe("warnings of spec E", () => {
  it("insufficient loops below three damaged loops", () => {
    const points = cyclicRecord(DEMO_PARAMS, "tension-1", [0.002, 0.004, 0.006]);
    const result = identify([{ id: "short", testType: "tension-1", points }], { base });
    expect(result.warnings).toContain("insufficient loops");
    expect(result.identified).not.toContain("a1");
    expect(result.params.a1).toBe(base.a1);
  });

  it("clearly positive intercept when residual strain carries a creep offset", () => {
    const points = demoCyclicTension();
    const strain = points.strain.map((e, i) => (i >= 120 ? e + 0.0004 : e)); // after loop 1
    const result = identify(
      [{ id: "creep", testType: "tension-1", points: { ...points, strain } }],
      { base },
    );
    expect(result.warnings).toContain(
      "clearly positive intercept: creep/viscoelastic residual strain not modelled",
    );
    expect(result.records[0].freeIntercept).toBeCloseTo(0.0004, 6);
  });

  it("hysteresis when reloading is stiffer than unloading by more than 10 %", () => {
    const points = demoCyclicTension();
    // Reloading branches (first 30 increments of each loading leg after the first) made stiffer.
    const stress = points.stress.map((s, i) => {
      const inLeg = i % 120;
      return i > 120 && inLeg > 0 && inLeg <= 30 ? s * 1.2 : s;
    });
    const result = identify(
      [{ id: "hyst", testType: "tension-1", points: { ...points, stress } }],
      { base },
    );
    expect(result.warnings).toContain("hysteresis");
    expect(result.records[0].loops.some((l) => l.chordE !== null)).toBe(true);
  });

  describe("unilateral check (spec E.11)", () => {
    const legs = strainLegs([
      [
        ["e", "s", "s"],
        [0.002, 0, 0],
      ],
      [
        ["s", "s", "s"],
        [0, 0, 0],
      ],
      [
        ["e", "s", "s"],
        [0.006, 0, 0],
      ],
      [
        ["s", "s", "s"],
        [0, 0, 0],
      ],
      [
        ["e", "s", "s"],
        [0.008, 0, 0],
      ],
      [
        ["s", "s", "s"],
        [0, 0, 0],
      ],
      [
        ["e", "s", "s"],
        [0.01, 0, 0],
      ],
      [
        ["s", "s", "s"],
        [0, 0, 0],
      ],
      [
        ["e", "s", "s"],
        [-0.004, 0, 0],
      ],
      [
        ["s", "s", "s"],
        [0, 0, 0],
      ],
    ]);
    const run = runPath(DEMO_PARAMS, legs);
    const points: RecordPoints = {
      strain: run.columns.eps11.slice(0, run.rows),
      stress: run.columns.sig11.slice(0, run.rows),
    };
    it("full recovery in compression (the model's own output): no warning", () => {
      const result = identify([{ id: "tc", testType: "tension-1", points }], { base });
      expect(result.warnings).not.toContain("partial stiffness recovery — model assumes full");
    });
    it("compression 20 % softer than E0: warning", () => {
      const stress = points.stress.map((s) => (s < 0 ? 0.8 * s : s));
      const result = identify(
        [{ id: "tc", testType: "tension-1", points: { ...points, stress } }],
        { base },
      );
      expect(result.warnings).toContain("partial stiffness recovery — model assumes full");
    });
  });
});

describe("failure damage (spec E.10)", () => {
  it("from the rupture point when the record ends loaded", () => {
    const points = cyclicRecord(DEMO_PARAMS, "tension-1", D18_PEAKS.slice(0, 6), {
      finalLoad: 0.013,
    });
    const result = identify([{ id: "rupture", testType: "tension-1", points }], { base });
    // spec D.4: d(ε) = (ε − ε0)/0.02747333 at ε = 0.013
    expect(result.params.dcrit).toBeCloseTo((0.013 - 0.003015113) / 0.02747333, 5);
    expect(result.notes.join(" ")).toMatch(/rupture/);
  });
});

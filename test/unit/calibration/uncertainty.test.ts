/**
 * Uncertainty of a refinement (issue 14, item 4): the t quantile against its table, the
 * covariance against the closed form of straight-line regression, and the coverage of the 95 %
 * intervals on seeded noisy records from the driver.
 */
import { describe, expect, it } from "vitest";

import { D18_PEAKS, DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import { refine, uncertaintyAt } from "@/lib/calibration/refine";
import { fitUncertainty, tQuantile975 } from "@/lib/calibration/uncertainty";

import { cyclicRecord } from "./driver-records";

describe("tQuantile975", () => {
  // Abramowitz & Stegun, Handbook of Mathematical Functions (1964), Table 26.10, column Q = 0.025.
  it.each([
    [5, 2.571],
    [10, 2.228],
    [20, 2.086],
    [30, 2.042],
    [60, 2.0],
    [120, 1.98],
    [1e9, 1.96],
  ])("ν = %d gives %f to 1e-3", (nu, table) => {
    expect(Math.abs(tQuantile975(nu) - table)).toBeLessThan(1e-3);
  });
});

describe("fitUncertainty", () => {
  // Straight line y = a + b·x: Var(b) = s²/Sxx, Var(a) = s²·(1/n + x̄²/Sxx),
  // Cov(a, b) = −s²·x̄/Sxx (Draper & Smith, Applied Regression Analysis, 3rd ed. 1998, §1.4 and §3.2).
  const x = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9];
  const r = [0.1, -0.2, 0.05, 0.15, -0.1, 0, 0.2, -0.15, -0.05, 0.1];
  const n = x.length;
  const mean = x.reduce((s, v) => s + v, 0) / n;
  const sxx = x.reduce((s, v) => s + (v - mean) ** 2, 0);
  const s2 = r.reduce((s, v) => s + v * v, 0) / (n - 2);

  it("matches the closed form of straight-line regression", () => {
    const u = fitUncertainty(
      x.map((v) => [1, v]),
      r,
      ["a", "b"],
      [1, 1],
      [2, 3],
    )!;
    expect(u.degreesOfFreedom).toBe(8);
    expect(u.params[1].se).toBeCloseTo(Math.sqrt(s2 / sxx), 12);
    expect(u.params[0].se).toBeCloseTo(Math.sqrt(s2 * (1 / n + mean ** 2 / sxx)), 12);
    const cov = (-s2 * mean) / sxx;
    expect(u.correlation[0][1]).toBeCloseTo(cov / (u.params[0].se! * u.params[1].se!), 12);
    expect(u.correlation[0][0]).toBe(1);
    // 95 % interval with t(8) = 2.306 (A&S Table 26.10)
    expect(u.params[1].high! - 3).toBeCloseTo(2.306 * u.params[1].se!, 2);
  });

  it("carries the scale of each unknown into its unit", () => {
    // u_j = value_j / scale_j: doubling a scale doubles that standard error
    const plain = fitUncertainty(
      x.map((v) => [1, v]),
      r,
      ["a", "b"],
      [1, 1],
      [2, 3],
    )!;
    const scaled = fitUncertainty(
      x.map((v) => [1, v]),
      r,
      ["a", "b"],
      [1, 2],
      [2, 6],
    )!;
    expect(scaled.params[1].se).toBeCloseTo(2 * plain.params[1].se!, 12);
    expect(scaled.params[0].se).toBeCloseTo(plain.params[0].se!, 12);
  });

  it("gives no error for a parameter the data do not move, instead of a zero", () => {
    const u = fitUncertainty(
      x.map((v) => [1, v, 0]),
      r,
      ["a", "b", "c"],
      [1, 1, 1],
      [2, 3, 4],
    )!;
    expect(u.params[2].se).toBeNull();
    expect(u.params[2].low).toBeNull();
    expect(u.correlation[2][0]).toBeNull();
    expect(u.params[1].se).not.toBeNull();
  });

  it("has nothing to say with no free parameter or too few samples", () => {
    expect(fitUncertainty([], [], [], [], [])).toBeNull();
    expect(
      fitUncertainty([[1], [2]], [0.1, 0.2], ["a", "b"].slice(0, 2), [1, 1], [1, 1]),
    ).toBeNull();
  });
});

describe("coverage of the 95 % intervals", () => {
  // Records from the driver with seeded uniform stress noise (half-width 0.5 MPa) around the demo
  // set (spec A.3); refinement from a perturbed start. Statistical check with a stated tolerance:
  // each interval should contain the true value in 88–99 % of 200 repetitions.
  it("contains the true E1, Y0_1, a1 and alpha in 88–99 % of 200 noisy repetitions", () => {
    const names = ["E1", "Y0_1", "a1", "alpha"] as const;
    const hits = { E1: 0, Y0_1: 0, a1: 0, alpha: 0 };
    const start = {
      ...DEMO_PARAMS,
      E1: DEMO_PARAMS.E1 * 1.05,
      Y0_1: DEMO_PARAMS.Y0_1 * 1.1,
      a1: DEMO_PARAMS.a1 * 0.95,
      alpha: DEMO_PARAMS.alpha * 1.1,
    };
    const repetitions = 200;
    for (let k = 0; k < repetitions; k++) {
      const points = cyclicRecord(DEMO_PARAMS, "tension-1", D18_PEAKS, {
        increments: 20,
        noiseStress: 0.5,
        seed: 1000 + k,
      });
      const result = refine([{ id: "t", name: "noisy", testType: "tension-1", points }], start, {
        free: [...names],
        isotropic: false,
      });
      for (const p of result.uncertainty!.params) {
        const truth = DEMO_PARAMS[p.name as (typeof names)[number]];
        if (p.low! <= truth && truth <= p.high!) hits[p.name as (typeof names)[number]]++;
      }
    }
    for (const name of names) {
      expect(hits[name] / repetitions, name).toBeGreaterThanOrEqual(0.88);
      expect(hits[name] / repetitions, name).toBeLessThanOrEqual(0.99);
    }
  }, 240_000);
});

describe("uncertaintyAt", () => {
  it("gives at a refinement's answer the same intervals the refinement reported", () => {
    const points = cyclicRecord(DEMO_PARAMS, "tension-1", D18_PEAKS, {
      increments: 20,
      noiseStress: 0.5,
      seed: 7,
    });
    const records = [{ id: "t", testType: "tension-1" as const, points }];
    const options = { free: ["E1", "Y0_1", "a1", "alpha"] as const, isotropic: false };
    const fit = refine(
      records,
      { ...DEMO_PARAMS, E1: 10500 },
      { ...options, free: [...options.free] },
    );
    const again = uncertaintyAt(records, fit.params, { ...options, free: [...options.free] })!;
    for (const [j, p] of again.params.entries()) {
      const reported = fit.uncertainty!.params[j];
      expect(p.name).toBe(reported.name);
      expect(p.se! / reported.se! - 1).toBeLessThan(1e-3);
    }
    expect(uncertaintyAt(records, fit.params, { free: [], isotropic: false })).toBeNull();
  });
});

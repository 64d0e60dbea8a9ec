/** The small building blocks of spec E on hand-built data with known answers. */
import { describe, expect, it } from "vitest";
import { fitFrozenStrain } from "@/lib/calibration/frozen-strain";
import { leastSquaresLine, theilSenLine } from "@/lib/calibration/line-fit";
import { mad, median, movingMedian, noiseOfSignal } from "@/lib/calibration/robust-stats";
import { fitThreshold, loopForce } from "@/lib/calibration/threshold-fit";

describe("robust statistics", () => {
  it("median and MAD", () => {
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 2, 3])).toBe(2.5);
    expect(mad([1, 2, 3, 4, 100])).toBe(1);
  });
  it("noise of a straight ramp is zero; of an alternating ±w signal it is about 1.4826·w·sqrt(2)", () => {
    expect(noiseOfSignal(Float64Array.from({ length: 50 }, (_, i) => 0.001 * i))).toBe(0);
    const w = 0.05;
    const alternating = Float64Array.from({ length: 51 }, (_, i) => (i % 2 ? w : -w));
    // every difference is ±2w, so MAD = 2w: 1.4826·2w/sqrt(2)
    expect(noiseOfSignal(alternating)).toBeCloseTo((1.4826 * 2 * w) / Math.SQRT2, 12);
  });
  it("the 5-point moving median removes a two-sample spike and keeps a ramp", () => {
    const s = Float64Array.from({ length: 11 }, (_, i) => i);
    s[5] = 100;
    s[6] = -100;
    const m = movingMedian(s);
    expect(Array.from(m.slice(2, 9))).toEqual([2, 3, 3, 4, 7, 8, 8]);
    expect(Math.max(...m)).toBeLessThan(11);
  });
});

describe("lines", () => {
  it("least squares recovers an exact line with R² = 1", () => {
    const x = [0, 1, 2, 3];
    const fit = leastSquaresLine(
      x,
      x.map((v) => 2 * v - 1),
    );
    expect(fit.slope).toBeCloseTo(2, 12);
    expect(fit.intercept).toBeCloseTo(-1, 12);
    expect(fit.r2).toBeCloseTo(1, 12);
  });
  it("Theil–Sen ignores one wild point where least squares does not", () => {
    const x = [1, 2, 3, 4, 5, 6, 7];
    const y = x.map((v) => 0.5 * v + 1);
    y[6] = 40;
    const robust = theilSenLine(x, y);
    expect(robust.slope).toBeCloseTo(0.5, 12);
    expect(robust.intercept).toBeCloseTo(1, 12);
    expect(leastSquaresLine(x, y).slope).toBeGreaterThan(2);
  });
});

describe("threshold and slope (spec E.4, E.5)", () => {
  const a = 0.6;
  const Y0 = 0.05;
  const byLaw = (ds: number[], law: "sqrtY" | "linY") =>
    ds.map((d) => ({ d, Y: law === "sqrtY" ? (Math.sqrt(Y0) + d / a) ** 2 : Y0 + d / a }));

  it("d and Y per loop from moduli", () => {
    const f = loopForce(8203.333, 71.60515, 11000);
    expect(f.d).toBeCloseTo(0.2542425, 6);
    expect(f.Y).toBeCloseTo(0.4190545, 5); // spec D.4: Y1 at ε = 0.01
  });
  it("recovers a and Y0 exactly for both laws", () => {
    for (const law of ["sqrtY", "linY"] as const) {
      const out = fitThreshold(byLaw([0.05, 0.1, 0.2, 0.3], law), law);
      expect(out.ok).toBe(true);
      if (out.ok) {
        expect(out.fit.a).toBeCloseTo(a, 10);
        expect(out.fit.Y0).toBeCloseTo(Y0, 10);
        expect(out.fit.envelopeOk).toBe(true);
      }
    }
  });
  it("reports insufficient loops below 3 damaged loops", () => {
    expect(fitThreshold(byLaw([0.1, 0.2], "sqrtY"), "sqrtY")).toEqual({
      ok: false,
      reason: "insufficient loops",
    });
  });
  it("flags a failed envelope check", () => {
    const steep = [0.1, 0.2, 0.3].map((d) => ({ d, Y: (Math.sqrt(4) + d / 0.6) ** 2 }));
    const out = fitThreshold(steep, "sqrtY");
    expect(out.ok && out.fit.envelopeOk).toBe(false); // 0.6·sqrt(4) = 1.2 ≥ 1
  });
});

describe("frozen strain (spec E.6)", () => {
  it("alpha through the origin; a zero intercept is not flagged", () => {
    const d = [0.05, 0.1, 0.2, 0.3];
    const fit = fitFrozenStrain(
      d,
      d.map((v) => 0.005 * v),
      1e-6,
    );
    expect(fit?.alpha).toBeCloseTo(0.005, 14);
    expect(fit?.interceptClearlyPositive).toBe(false);
  });
  it("flags a clearly positive intercept (creep-like offset)", () => {
    const d = [0.05, 0.1, 0.2, 0.3];
    const fit = fitFrozenStrain(
      d,
      d.map((v, i) => 0.004 * v + 0.0008 + (i % 2 ? 1e-6 : -1e-6)),
      1e-6,
    );
    expect(fit?.freeIntercept).toBeCloseTo(0.0008, 5);
    expect(fit?.interceptClearlyPositive).toBe(true);
  });
});

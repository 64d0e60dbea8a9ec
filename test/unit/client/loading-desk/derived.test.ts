import { describe, expect, it } from "vitest";
import { deriveMeanings } from "@/lib/client/loading-desk/derived";
import { PRESETS, presetByKey } from "@/lib/client/loading-desk/presets";
import type { MaterialParams } from "@/lib/mechanics/types";

const demo = presetByKey("demo-smc")!.params as MaterialParams;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("what the values mean (spec D.4, closed form)", () => {
  it("gives the demo SMC's threshold, peak and failure flag", () => {
    const [axis1] = deriveMeanings(demo);
    expect(axis1).not.toBeNull();
    const m = axis1!;
    expect(rel(m.thresholdStress, 33.16625)).toBeLessThan(1e-6);
    expect(rel(m.thresholdStrain, 0.003015113)).toBeLessThan(1e-6);
    expect(rel(m.peakDamage, 0.432918)).toBeLessThan(1e-6);
    expect(rel(m.peakStress, 79.49721)).toBeLessThan(1e-6);
    expect(rel(m.peakStrain, 0.01490881)).toBeLessThan(1e-6);
    expect(rel(m.unloadingModulusAtPeak, 11000 * (1 - 0.432918))).toBeLessThan(1e-6);
    expect(rel(m.failureStress, 79.42507)).toBeLessThan(1e-6);
    expect(rel(m.failureStrain, 0.01537811)).toBeLessThan(1e-6);
    expect(m.failsBeforePeak).toBe(false);
  });

  it("uses the axis-2 values for axis 2", () => {
    const [a1, a2] = deriveMeanings({ ...demo, E2: 4000, Y0_2: 0.02 });
    expect(rel(a2!.thresholdStress, Math.sqrt(2 * 4000 * 0.02))).toBeLessThan(1e-12);
    expect(a1!.thresholdStress).not.toBe(a2!.thresholdStress);
  });

  it("flags a failure before the peak when dcrit is below the peak damage", () => {
    expect(deriveMeanings({ ...demo, dcrit: 0.2 })[0]!.failsBeforePeak).toBe(true);
  });

  it("uses the linY peak d = (1 − 2·a·Y0)/3", () => {
    const m = deriveMeanings({ ...demo, law: "linY", a1: 2 })[0]!;
    expect(m.peakDamage).toBeCloseTo((1 - 2 * 2 * 0.05) / 3, 12);
    // stress on the linY branch: (1−d)·sqrt(2E(Y0 + d/a))
    const d = m.peakDamage;
    expect(rel(m.peakStress, (1 - d) * Math.sqrt(2 * 11000 * (0.05 + d / 2)))).toBeLessThan(1e-12);
  });

  it("returns null for values that allow no meaning (NaN, a·sqrt(Y0) ≥ 1)", () => {
    expect(deriveMeanings({ ...demo, E1: Number.NaN })[0]).toBeNull();
    expect(deriveMeanings({ ...demo, a1: 10 })[0]).toBeNull();
  });

  it("every preset has a meaning on both axes and says it is invented", () => {
    for (const p of PRESETS) {
      const [a, b] = deriveMeanings(p.params as MaterialParams);
      expect(a && b).toBeTruthy();
      expect(p.name).toMatch(/invented/);
    }
  });
});

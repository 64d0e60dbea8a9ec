/**
 * Issue 14 item 5: k6 by grid scan then golden-section (spec E.9). Expected values are the k6
 * each synthetic record was made with (driver output, no noise), so recovery must be exact.
 */
import { describe, expect, it } from "vitest";
import { D18_PEAKS, DEMO_PARAMS, seededUniform } from "@/lib/calibration/demo-curves";
import { boundWarning, goldenSection, scannedSearch } from "@/lib/calibration/golden-section";
import { identify } from "@/lib/calibration/identify";
import { cyclicRecord } from "./driver-records";

const random = seededUniform(14);
const sets = Array.from({ length: 8 }, () => ({
  k6: 0.05 + 2.9 * random(),
  b: random(),
  Y0_1: 0.02 + 0.06 * random(),
}));

describe("shear weight k6 with a grid scan first", () => {
  it.each(sets)("recovers k6 = $k6 (b = $b, Y0_1 = $Y0_1) from driver records", (s) => {
    const truth = { ...DEMO_PARAMS, ...s, Y0_2: s.Y0_1 };
    const tension = cyclicRecord(truth, "tension-1", D18_PEAKS);
    const shear = cyclicRecord(truth, "shear-12", [0.006, 0.01, 0.014, 0.018, 0.022]);
    const result = identify(
      [
        { id: "t", testType: "tension-1", points: tension },
        { id: "s", testType: "shear-12", points: shear },
      ],
      { base: { ...DEMO_PARAMS, b: s.b, k6: 0 } },
    );
    expect(Math.abs(result.params.k6 - s.k6)).toBeLessThan(1e-4);
    expect(result.warnings.some((w) => w.includes("k6"))).toBe(false);
  });

  it("finds a narrow valley near the lower end that a plain golden-section misses", () => {
    // valley of width 0.2 at 0.1, then a slight slope down to 3: golden-section alone ends at 3
    const f = (x: number) => (x < 0.2 ? 10 * Math.abs(x - 0.1) - 1 : -0.01 * x);
    expect(goldenSection(f, 0, 3)).toBeGreaterThan(2.9);
    expect(scannedSearch(f, 0, 3)).toBeCloseTo(0.1, 4);
  });

  it("warns in plain words, naming the parameter, when the result sits on a bound", () => {
    expect(boundWarning("shear weight k6", 0, 0, 3)).toBe(
      "shear weight k6 sits on its lower bound 0: the records may not inform it",
    );
    expect(boundWarning("shear weight k6", 3, 0, 3)).toContain("upper bound 3");
    expect(boundWarning("shear weight k6", 1.2, 0, 3)).toBeNull();
  });
});

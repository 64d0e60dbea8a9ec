/** Spec E.7: direction 2 identified like direction 1, on an orthotropic set (spec D.14 set A). */
import { describe, expect, it } from "vitest";
import { DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import { identify } from "@/lib/calibration/identify";
import type { MaterialParams } from "@/lib/mechanics/types";
import { SET_A } from "../mechanics/helpers";
import { cyclicRecord } from "./driver-records";

const setA: MaterialParams = { ...DEMO_PARAMS, ...SET_A };
const rel = (x: number, ref: number) => Math.abs(x / ref - 1);

describe("orthotropic identification from tension along 1 and along 2", () => {
  const peaks = [0.001, 0.003, 0.005, 0.007, 0.009, 0.011];
  const t1 = cyclicRecord(setA, "tension-1", peaks);
  const t2 = cyclicRecord(setA, "tension-2", peaks);
  const { transverseStrain: _dropped, ...t1NoTransverse } = t1;

  it("recovers E, Y0, a of both axes, alpha and beta; nu12 from direction 1", () => {
    const r = identify(
      [
        { id: "1", testType: "tension-1", points: t1 },
        { id: "2", testType: "tension-2", points: t2 },
      ],
      { base: DEMO_PARAMS },
    );
    const expected = {
      E1: 9000,
      E2: 6000,
      Y0_1: 0.02,
      Y0_2: 0.03,
      a1: 0.5,
      a2: 0.7,
      alpha: 0.004,
      beta: 0.006,
      nu12: 0.35,
    };
    for (const [key, value] of Object.entries(expected)) {
      expect(rel(r.params[key as keyof typeof expected], value), key).toBeLessThan(1e-6);
    }
    expect(r.notes.join(" ")).not.toMatch(/isotropic/);
  });

  it("takes nu12 = nu21·E1/E2 from direction 2 when direction 1 has no transverse strain", () => {
    const r = identify(
      [
        { id: "1", testType: "tension-1", points: t1NoTransverse },
        { id: "2", testType: "tension-2", points: t2 },
      ],
      { base: { ...DEMO_PARAMS, nu12: 0.1 } },
    );
    expect(rel(r.params.nu12, 0.35)).toBeLessThan(1e-6);
  });
});

/** Spec E.8 (coupling b) and E.9 (shear weight k6) on driver output with known values. */
import { describe, expect, it } from "vitest";
import { couplingFromOffAxis } from "@/lib/calibration/coupling";
import { D18_PEAKS, DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import { identify } from "@/lib/calibration/identify";
import { shearWeightByReplay } from "@/lib/calibration/shear-weight";
import { runPath } from "@/lib/mechanics/driver";
import type { MaterialParams } from "@/lib/mechanics/types";
import { SET_A } from "../mechanics/helpers";
import { cyclicRecord } from "./driver-records";

const tension = {
  id: "t1",
  testType: "tension-1" as const,
  points: cyclicRecord(DEMO_PARAMS, "tension-1", D18_PEAKS),
};
const base = { ...DEMO_PARAMS, b: 0.9, k6: 2.2 };

describe("coupling b", () => {
  it("(a) transverse modulus after axial damage: b = 0.3 from spec D.5's E2(1 − d2)", () => {
    // Pre-damage to ε11 = 0.01 (Y1 = 0.4190545, spec D.4), unload, then a small σ22 cycle.
    const run = runPath(DEMO_PARAMS, [
      { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: 60 },
      { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 60 },
      { control: ["stress", "strain", "stress"], target: [0, 0.001, 0], increments: 60 },
      { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 60 },
    ]);
    const from = 121;
    const points = {
      strain: run.columns.eps22.slice(from, run.rows),
      stress: run.columns.sig22.slice(from, run.rows),
    };
    const result = identify(
      [
        tension,
        { id: "t2d", testType: "transverse-after-damage-1", points, preDamageY1: 0.4190545 },
      ],
      { base },
    );
    expect(result.params.b).toBeCloseTo(0.3, 5);
    expect(result.identified).toContain("b");
  });

  it("(b) equibiaxial loops against D.10: b = 0.3", () => {
    const points = cyclicRecord(DEMO_PARAMS, "equibiaxial", [0.002, 0.004, 0.006, 0.008]);
    const result = identify([tension, { id: "bi", testType: "biaxial", points }], { base });
    expect(result.params.b).toBeCloseTo(0.3, 4);
  });

  it("(c) off-axis tension at 30° of an orthotropic set, through the driver: b = 0.4", () => {
    const setA: MaterialParams = { ...DEMO_PARAMS, ...SET_A }; // spec D.14 set A
    const points = cyclicRecord(setA, "tension-1", [0.003, 0.006, 0.009], {
      thetaD: -30,
      increments: 30,
    });
    expect(couplingFromOffAxis(points, 30, { ...setA, b: 0 })).toBeCloseTo(0.4, 3);
  });
});

describe("shear weight k6", () => {
  const shear = cyclicRecord(DEMO_PARAMS, "shear-12", [0.006, 0.01, 0.014, 0.018, 0.022]);
  it("isotropic: D.11 closed form by golden-section gives k6 = 1 once b is known", () => {
    const result = identify([tension, { id: "s", testType: "shear-12", points: shear }], {
      base: { ...base, b: 0.3 },
    });
    expect(result.params.k6).toBeCloseTo(1, 4);
  });
  it("b from equibiaxial loops is found first and then used for k6", () => {
    const biaxial = cyclicRecord(DEMO_PARAMS, "equibiaxial", [0.002, 0.004, 0.006, 0.008]);
    const result = identify(
      [
        tension,
        { id: "s", testType: "shear-12", points: shear },
        { id: "bi", testType: "biaxial", points: biaxial },
      ],
      { base },
    );
    expect(result.params.b).toBeCloseTo(0.3, 4);
    expect(result.params.k6).toBeCloseTo(1, 4);
  });
  it("by replay through the driver gives k6 = 1", () => {
    expect(shearWeightByReplay(shear, { ...DEMO_PARAMS, k6: 2 })).toBeCloseTo(1, 3);
  });
});

/**
 * The bounds check before refinement (issue 14): ranges from spec damage-law.md A.3, labels from
 * lib/scenario/parameter-fields.ts. Start values are the A.3 demo set (E1 = E2 = 11000 MPa,
 * nu12 = 0.30, Y0 = 0.05 MPa, a = 0.6 MPa^-0.5, b = 0.3, k6 = 1, alpha = beta = 0.005).
 */
import { describe, expect, it } from "vitest";
import { DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import { refine } from "@/lib/calibration/refine";
import { checkRefineBounds, RefineBoundsError } from "@/lib/calibration/refine-bounds-check";
import { cyclicRecord } from "./driver-records";

describe("checkRefineBounds", () => {
  it("passes the default boxes around an admissible start", () => {
    expect(
      checkRefineBounds(DEMO_PARAMS, ["E1", "E2", "nu12", "G12", "Y0_1", "a1", "b", "k6", "alpha"]),
    ).toEqual([]);
  });

  it("names the field by its label when the lower bound is above the upper", () => {
    const out = checkRefineBounds(DEMO_PARAMS, ["E1"], { E1: [12000, 9000] });
    expect(out).toEqual([
      "E1 (Young's modulus, axis 1): the lower bound 12000 is above the upper bound 9000.",
    ]);
  });

  it("refuses a start value outside its box", () => {
    const out = checkRefineBounds(DEMO_PARAMS, ["Y0_1"], { Y0_1: [0.06, 0.5] });
    expect(out).toEqual([
      "Y0_1 (damage threshold, axis 1): the start value 0.05 is outside its bounds [0.06, 0.5].",
    ]);
  });

  it("refuses boxes outside the admissible ranges of A.3", () => {
    const out = checkRefineBounds(DEMO_PARAMS, ["G12", "b", "k6", "alpha", "a1"], {
      G12: [0, 5000], // moduli > 0
      b: [0, 1.2], // b in [0, 1]
      k6: [-0.1, 2], // k6 in [0, 3]
      alpha: [0, 0.06], // alpha in [0, 0.05]
      a1: [-1, 1], // a > 0
    });
    expect(out).toEqual([
      "G12 (shear modulus): the lower bound 0 is outside the admissible range (> 0).",
      "b (coupling of the crack families): the upper bound 1.2 is outside the admissible range (in [0, 1]).",
      "k6 (shear weight in crack compliance): the lower bound -0.1 is outside the admissible range (in [0, 3]).",
      "alpha (permanent strain factor, axis 1): the upper bound 0.06 is outside the admissible range (in [0, 0.05]).",
      expect.stringMatching(/^a1 \(damage growth slope, axis 1\): the lower bound -1 is outside/),
    ]);
  });

  it("bounds the Poisson ratio by sqrt(E1/E2) of the start set", () => {
    // E1 = 4000, E2 = 16000: A.3 admits |nu12| < sqrt(4000/16000) = 0.5, so 0.5 itself is out.
    const start = { ...DEMO_PARAMS, E1: 4000, E2: 16000, nu12: 0.3 };
    expect(checkRefineBounds(start, ["nu12"], { nu12: [0, 0.49] })).toEqual([]);
    expect(checkRefineBounds(start, ["nu12"], { nu12: [0, 0.5] })).toEqual([
      "nu12 (Poisson ratio): the upper bound 0.5 is outside the admissible range (|nu12| < √(E1/E2)).",
    ]);
  });

  it("checks the fixed values of the start set too (dmax in [0.9, 0.999])", () => {
    const out = checkRefineBounds({ ...DEMO_PARAMS, dmax: 1.2 }, ["E1"]);
    expect(out).toEqual(["dmax (damage cap): the start value must be in [0.9, 0.999]."]);
  });

  it("stops refine before any replay", () => {
    const record = {
      id: "t1",
      testType: "tension-1" as const,
      points: cyclicRecord(DEMO_PARAMS, "tension-1", [0.01], { increments: 10 }),
    };
    let rounds = 0;
    const run = () =>
      refine([record], DEMO_PARAMS, {
        free: ["E1"],
        bounds: { E1: [12000, 9000] },
        onProgress: () => rounds++,
      });
    expect(run).toThrow(RefineBoundsError);
    expect(run).toThrow(/Young's modulus, axis 1/);
    expect(rounds).toBe(0);
  });
});

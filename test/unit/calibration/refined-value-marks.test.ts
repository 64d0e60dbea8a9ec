/** The words beside refined values (issue 14): refined, tied to axis 1, not informed. */
import { describe, expect, it } from "vitest";
import { DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import { refine } from "@/lib/calibration/refine";
import { FITTABLE } from "@/lib/calibration/refine-params";
import { refinedValueMarks } from "@/lib/calibration/refined-value-marks";
import { cyclicRecord } from "./driver-records";

describe("refined-value marks", () => {
  it("marks a 0° tension refinement of an isotropic set honestly", () => {
    // Records made by the driver from the demo set (spec A.3); the start is the set itself.
    const points = cyclicRecord(DEMO_PARAMS, "tension-1", [0.004, 0.008], { increments: 20 });
    const result = refine([{ id: "t", testType: "tension-1", points }], DEMO_PARAMS, {
      free: [...FITTABLE],
      maxRounds: 1,
    });
    const marks = refinedValueMarks(result);
    expect(marks.E1).toBe("refined");
    expect(marks.alpha).toBe("refined");
    for (const k of ["E2", "Y0_2", "a2", "beta", "G12"] as const)
      expect(marks[k]).toBe("tied to axis 1");
    for (const k of ["nu12", "b", "k6"] as const)
      expect(marks[k]).toBe("not informed by these records");
    expect(Object.values(marks)).not.toContain(undefined);
  });

  it("says a value the identification took from the records and the refinement kept is identified, kept", () => {
    // dcrit is found from the records (spec E) and is no refinement unknown; a1 the user fixed.
    const marks = refinedValueMarks({ free: ["E1"], tied: ["E2"], notInformed: ["k6"] }, [
      "E1",
      "E2",
      "a1",
      "dcrit",
    ]);
    expect(marks).toEqual({
      E1: "refined",
      E2: "tied to axis 1",
      k6: "not informed by these records",
      a1: "identified, kept",
      dcrit: "identified, kept",
    });
  });

  it("leaves values the user fixed without a mark", () => {
    const marks = refinedValueMarks({ free: ["E1"], tied: [], notInformed: ["E2"] });
    expect(marks).toEqual({ E1: "refined", E2: "not informed by these records" });
  });
});

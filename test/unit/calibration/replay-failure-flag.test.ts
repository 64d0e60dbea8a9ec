import { describe, expect, it } from "vitest";

import { DEMO_PARAMS, demoCyclicTension } from "@/lib/calibration/demo-curves";
import { replayRecord } from "@/lib/calibration/replay";

// The identified dcrit is often the damage of the last loop (spec E.10). A replay must still
// follow the whole record: the failure flag is no reason to change the replayed curve.
describe("replay of a record past the parameter set's dcrit", () => {
  it("reproduces the exact curve although damage passes dcrit (spec D.4/D.5 curve)", () => {
    const points = demoCyclicTension(DEMO_PARAMS); // peaks to 0.014: d1 reaches 0.39
    const lowFlag = { ...DEMO_PARAMS, dcrit: 0.2 };
    const { predicted, completed } = replayRecord(lowFlag, "tension-1", points);
    expect(completed).toBe(points.strain.length);
    let worst = 0;
    for (let i = 0; i < completed; i++) {
      worst = Math.max(worst, Math.abs(predicted[i] - points.stress[i]));
    }
    // Same law, same history, no noise: only round-off separates the two curves.
    expect(worst).toBeLessThan(1e-6);
  });
});

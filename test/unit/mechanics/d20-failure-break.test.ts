/** Spec damage-law.md D.20 and C.7: failure inside a sub-stepped increment, the break rule. */
import { describe, expect, it } from "vitest";
import { DEMO, E, S, expectRel, last, leg, run } from "./helpers";

describe("D.20 failure inside a sub-stepped increment ('stop')", () => {
  it("one increment to eps11 = 0.0175: 2 rows, the last is the sub-step that reached dcrit", () => {
    const r = run({}, [leg([E, S, S], [0.0175, 0, 0], 1)]);
    const c = r.columns;
    expect(r.rows).toBe(2);
    expect(r.status.failed).toBe(true);
    expect(r.status.failMode).toBe("dcrit axis 1");
    expect(r.status.stoppedAtStep).toBe(1);
    expect(c.failed[1]).toBe(1);
    expect(c.d1[1]).toBeGreaterThanOrEqual(DEMO.dcrit);
    expect(c.d1[1]).toBeLessThanOrEqual(DEMO.dcrit + 0.05);
    // a partial increment on the 2^-k grid of the user increment (hmin = 2^-12)
    expect(c.eps11[1]).toBeLessThan(0.0175);
    const k = (c.eps11[1] / 0.0175) * 4096;
    expect(Math.abs(k - Math.round(k))).toBeLessThan(1e-6);
    // the row is a converged state of the law: D.4 strain-control closed form at that strain
    const sY0 = Math.sqrt(DEMO.Y0_1);
    const slope = Math.sqrt(2 / DEMO.E1) / DEMO.a1 + DEMO.alpha;
    const d = (c.eps11[1] - Math.sqrt(2 / DEMO.E1) * sY0) / slope;
    expectRel(c.d1[1], d, 1e-9);
  });

  it("failMode keeps the first failure: dcrit, then a limit load after the break", () => {
    // family 1 fails in strain control (break with 'continue'); then stress control on axis 2
    // beyond the peak of family 2 (d_peak = 0.433 < dcrit, D.4): a limit load ends the path
    // but failMode stays 'dcrit axis 1'
    const r = run({ onFailure: "continue" }, [
      leg([E, S, S], [0.0175, 0, 0], 10),
      leg([S, S, S], [0, 0, 0], 5),
      leg([S, S, S], [0, 100, 0], 40),
    ]);
    expect(r.status.failed).toBe(true);
    expect(r.status.failMode).toBe("dcrit axis 1");
    expect(r.status.stoppedAtStep).toBe(last(r));
    expect(last(r)).toBeLessThan(55);
    expect(r.columns.sig22[last(r)]).toBeLessThan(79.49721); // D.4 sigma_max
  });
});

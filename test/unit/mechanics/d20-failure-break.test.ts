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
    expect(r.status.stoppedAtIncrement).toBe(1);
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
    expect(r.status.stoppedAtIncrement).toBe(last(r));
    expect(last(r)).toBeLessThan(55);
    expect(r.columns.sig22[last(r)]).toBeLessThan(79.49721); // D.4 sigma_max
  });
});

describe("D.20 the break with onFailure 'continue' (spec C.7)", () => {
  it("d1 = dmax, dp1 kept, sig11 = E1(1 − dmax)(eps11 − alpha·dp1), W continuous, ΔPhi = −Δpsi", () => {
    const legs = [
      leg([E, S, S], [0.0175, 0, 0], 1),
      leg([E, S, S], [0.02, 0, 0], 50),
      leg([E, S, S], [-0.005, 0, 0], 50),
    ];
    const r = run({ onFailure: "continue" }, legs);
    const c = r.columns;
    expect(r.status.failMode).toBe("dcrit axis 1");
    expect(r.status.stoppedAtIncrement).toBeNull();
    expect(r.rows).toBe(102);
    // the 'stop' run gives the sub-step that reached dcrit: its dp1 must survive the break
    const stop = run({}, [legs[0]]);
    const dpAtDcrit = stop.columns.dp1[1];
    // the integration error of the rows before the break (trapezoid W vs midpoint Phi)
    const gap = stop.columns.W[1] - stop.columns.psi[1] - stop.columns.Phi[1];
    for (let i = 1; i < r.rows; i++) {
      expect(c.d1[i]).toBe(DEMO.dmax);
      expect(c.dp1[i]).toBe(dpAtDcrit);
      if (c.sig11[i] > 0) {
        expectRel(
          c.sig11[i],
          DEMO.E1 * (1 - DEMO.dmax) * (c.eps11[i] - DEMO.alpha * dpAtDcrit),
          1e-9,
        );
      }
      expect(c.Phi[i]).toBeGreaterThanOrEqual(c.Phi[i - 1] - 1e-12 * (1 + c.W[i]));
      // the break and the linear-elastic rows after it keep W − psi − Phi (the trapezoid is
      // only inexact on the row that crosses closure, where the slope jumps)
      if (c.sig11[i] > 0 && c.sig11[i - 1] >= 0) {
        expect(Math.abs(c.W[i] - c.psi[i] - c.Phi[i] - gap)).toBeLessThanOrEqual(1e-12);
      }
    }
    // the break row: W of the 'stop' row plus the rest of the increment's (strain-controlled)
    // work; Phi rises by psi_before − psi_after across the break, so W = psi + Phi stays exact
    // across the break (strain control, ΔW = 0 at the same prescribed values): Phi rises by
    // psi_before − psi_after; the rest of increment 1 is elastic
    expectRel(
      c.Phi[1] - stop.columns.Phi[1],
      stop.columns.psi[1] - c.psi[1] + (c.W[1] - stop.columns.W[1]),
      1e-9,
    );
    expect(c.Phi[1]).toBeGreaterThan(stop.columns.Phi[1]);
    // compression at full stiffness E1 once sig11 < 0 (closure)
    const n = r.rows - 1;
    expect(c.sig11[n]).toBeLessThan(0);
    expectRel(c.sig11[n], DEMO.E1 * (-0.005 - DEMO.alpha * dpAtDcrit), 1e-9);
  });
});

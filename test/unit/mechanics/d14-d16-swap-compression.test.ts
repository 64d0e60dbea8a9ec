/** Spec damage-law.md D.14 (axis swap) and D.16 (pure compression). */
import { describe, expect, it } from "vitest";
import type { Leg, MaterialParams } from "@/lib/mechanics/types";
import { DEMO, E, S, SET_A, expectRel, last, leg, run } from "./helpers";

describe("D.14 axis swap", () => {
  const A: Partial<MaterialParams> = SET_A;
  const B: Partial<MaterialParams> = {
    ...A,
    E1: 6000,
    E2: 9000,
    nu12: (0.35 * 6000) / 9000,
    Y0_1: 0.03,
    Y0_2: 0.02,
    a1: 0.7,
    a2: 0.5,
    alpha: 0.006,
    beta: 0.004,
  };
  const pts: [number, number, number][] = [
    [0.006, 0.002, 0.004],
    [0.001, 0.004, -0.002],
    [-0.003, 0.007, 0.005],
    [0, 0, 0],
  ];
  const legsA: Leg[] = pts.map((t) => leg([E, E, E], t, 60));
  const legsB: Leg[] = pts.map(([x, y, g]) => leg([E, E, E], [y, x, g], 60));

  it("every step: sig_B = swap(sig_A), d_B = swap(d_A) to 1e-12 (spec D.14)", () => {
    const ra = run(A, legsA);
    const rb = run(B, legsB);
    expect(rb.rows).toBe(ra.rows);
    expect(rb.status.failMode).toBe(ra.status.failMode);
    const a = ra.columns;
    const b = rb.columns;
    const close = (x: number, y: number) =>
      expect(Math.abs(x - y)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(x)));
    let maxD = 0;
    for (let i = 0; i < ra.rows; i++) {
      close(b.sig11[i], a.sig22[i]);
      close(b.sig22[i], a.sig11[i]);
      close(b.sig12[i], a.sig12[i]);
      close(b.d1[i], a.d2[i]);
      close(b.d2[i], a.d1[i]);
      close(b.dp1[i], a.dp2[i]);
      close(b.eps11[i], a.eps22[i]);
      maxD = Math.max(maxD, a.d1[i], a.d2[i]);
    }
    expect(maxD).toBeGreaterThan(0.05); // the path damages both sets
  });
});

describe("D.16 pure compression", () => {
  it("uniaxial [e,s,s] to −0.02: sig = −220 MPa, d = 0 (spec D.16)", () => {
    const r = run({}, [leg([E, S, S], [-0.02, 0, 0], 100)]);
    const n = last(r);
    expectRel(r.columns.sig11[n], DEMO.E1 * -0.02, 1e-12);
    expectRel(r.columns.sig11[n], -220, 1e-9);
    expect(r.columns.d1[n]).toBe(0);
    expect(r.columns.d2[n]).toBe(0);
    expect(r.status.failed).toBe(false);
    expect(r.status.warnings).toEqual([]);
  });

  it("with Xc = 200 MPa: warning 'compression strength exceeded', not failed (spec D.16, C.7)", () => {
    const r = run({ Xc: 200 }, [leg([E, S, S], [-0.02, 0, 0], 100)]);
    expect(r.status.failed).toBe(false);
    expect(r.status.warnings).toEqual(["compression strength exceeded"]);
    expect(r.columns.failed[last(r)]).toBe(0);
    expect(r.rows).toBe(101);
  });
});

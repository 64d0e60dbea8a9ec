/** Spec damage-law.md D.1–D.3: the undamaged response. */
import { describe, expect, it } from "vitest";
import { localStepFrom } from "@/lib/mechanics/single-step";
import { DEMO, E, S, expectRel, last, leg, run } from "./helpers";

describe("D.1 undamaged orthotropic Hooke (Jones 1999, ch. 2, plane-stress reduced stiffness Q_ij)", () => {
  const p = { E1: 9000, E2: 6000, nu12: 0.35, G12: 2500 };
  // Jones, Mechanics of Composite Materials, 2nd ed. (1999), ch. 2: Q11 = E1/(1 − nu12·nu21),
  // Q22 = E2/(1 − nu12·nu21), Q12 = nu12·E2/(1 − nu12·nu21), Q66 = G12, nu21 = nu12·E2/E1.
  const nu21 = (p.nu12 * p.E2) / p.E1;
  const den = 1 - p.nu12 * nu21;
  const Q11 = p.E1 / den;
  const Q22 = p.E2 / den;
  const Q12 = (p.nu12 * p.E2) / den;
  const Q66 = p.G12;
  const eps = [0.002, -0.001, 0.003];
  const sig = [Q11 * eps[0] + Q12 * eps[1], Q12 * eps[0] + Q22 * eps[1], Q66 * eps[2]];

  it("the product's undamaged tangent is Q with the spec's values (spec D.1 table, 7 digits)", () => {
    // Ct of an elastic all-strain step is Csec = S_L⁻¹ (C.6): the reduced stiffness itself
    const ct = localStepFrom({ ...DEMO, ...p }, null, [E, E, E], eps).tangent;
    expectRel(ct[0], 9800.363, 1e-6);
    expectRel(ct[4], 6533.575, 1e-6);
    expectRel(ct[1], 2286.751, 1e-6);
    expectRel(ct[3], 2286.751, 1e-6);
    expectRel(ct[8], 2500, 1e-9);
    expect(Math.abs(ct[2]) + Math.abs(ct[5]) + Math.abs(ct[6]) + Math.abs(ct[7])).toBe(0);
  });

  it("all-strain control gives sig = Q·eps (Jones ch. 2; spec D.1 closed form 1e-9)", () => {
    const r = run(p, [leg([E, E, E], [eps[0], eps[1], eps[2]], 10)]);
    const n = last(r);
    expectRel(r.columns.sig11[n], sig[0], 1e-9);
    expectRel(r.columns.sig22[n], sig[1], 1e-9);
    expectRel(r.columns.sig12[n], sig[2], 1e-9);
    // spec D.1 table values
    expectRel(r.columns.sig11[n], 17.31397, 1e-6);
    expectRel(r.columns.sig22[n], -1.960073, 1e-6);
    expectRel(r.columns.sig12[n], 7.5, 1e-6);
    expect(r.columns.d1[n]).toBe(0);
    expect(r.columns.d2[n]).toBe(0);
  });

  it("Y_i = (<s_ii>+² + k6·s12²)/(2E_i) (spec B.5, D.1 values)", () => {
    const r = run(p, [leg([E, E, E], [eps[0], eps[1], eps[2]], 1)]);
    const Y1 = (sig[0] ** 2 + sig[2] ** 2) / (2 * p.E1);
    const Y2 = sig[2] ** 2 / (2 * p.E2);
    expectRel(r.columns.Y1[1], Y1, 1e-9);
    expectRel(r.columns.Y2[1], Y2, 1e-9);
    expectRel(r.columns.Y1[1], 0.0197791, 1e-6);
    expectRel(r.columns.Y2[1], 0.0046875, 1e-6);
    expect(r.columns.Ybar1[1]).toBeLessThan(DEMO.Y0_1);
  });

  it("the elastic tangent equals Q (spec C.6: Ct = Csec in elastic steps)", () => {
    const s = localStepFrom({ ...DEMO, ...p }, null, [E, E, E], eps);
    expect(s.ok).toBe(true);
    const Q = [Q11, Q12, 0, Q12, Q22, 0, 0, 0, Q66];
    for (let k = 0; k < 9; k++) expectRel(s.tangent[k], Q[k], 1e-12, 1e-9);
  });
});

describe("D.2 path independence of the elastic part", () => {
  // isotropic plane stress, closed form
  const { E1: Em, nu12: nu, G12 } = DEMO;
  const q = Em / (1 - nu * nu);
  const target = [0.002, 0.001, 0.001] as const;
  const expected = [
    q * (target[0] + nu * target[1]),
    q * (nu * target[0] + target[1]),
    G12 * target[2],
  ];

  it("direct and detoured paths give the same stress (spec D.2)", () => {
    const direct = run({}, [leg([E, E, E], [...target], 7)]);
    const detour = run({}, [
      leg([E, E, E], [0, 0.001, 0], 5),
      leg([E, E, E], [-0.001, 0, 0.002], 9),
      leg([E, E, E], [...target], 4),
    ]);
    for (const r of [direct, detour]) {
      const n = last(r);
      const got = [r.columns.sig11[n], r.columns.sig22[n], r.columns.sig12[n]];
      for (let k = 0; k < 3; k++) expectRel(got[k], expected[k], 1e-9);
      expectRel(got[0], 27.8022, 1e-6); // spec D.2 table
      expectRel(got[1], 19.34066, 1e-6);
      expectRel(got[2], 4.230769, 1e-6);
      expect(r.columns.d1[n]).toBe(0);
      expect(r.columns.d2[n]).toBe(0);
    }
  });
});

describe("D.3 no damage below threshold", () => {
  it("uniaxial to 0.0030 and back: peak 33 MPa, d = 0, W = Phi = 0 (spec D.3)", () => {
    const r = run({}, [leg([E, S, S], [0.003, 0, 0], 100), leg([E, S, S], [0, 0, 0], 100)]);
    expectRel(r.columns.sig11[100], 11000 * 0.003, 1e-12);
    expectRel(r.columns.sig11[100], 33.0, 1e-9);
    const n = last(r);
    for (let i = 0; i < r.rows; i++) {
      expect(r.columns.d1[i]).toBe(0);
      expect(r.columns.d2[i]).toBe(0);
    }
    expect(Math.abs(r.columns.sig11[n])).toBeLessThanOrEqual(1e-12);
    expect(Math.abs(r.columns.W[n])).toBeLessThanOrEqual(1e-15);
    expect(Math.abs(r.columns.Phi[n])).toBeLessThanOrEqual(1e-15);
  });
});

/** Spec damage-law.md D.10–D.13: equibiaxial tension, shear (fixed and onset frame), closure. */
import { describe, expect, it } from "vitest";
import type { Leg } from "@/lib/mechanics/types";
import { DEMO, E, S, expectRel, last, leg, run, uniaxial } from "./helpers";

const { E1: Em, nu12: nu, a1: a, Y0_1: Y0, b, k6, alpha, G12 } = DEMO;
const sY0 = Math.sqrt(Y0);

describe("D.10 equibiaxial tension [e,e,s]", () => {
  const sig = (d: number) => ((1 - d) * Math.sqrt(2 * Em) * (sY0 + d / a)) / Math.sqrt(1 + b);
  const eps = (d: number) => (sig(d) * (1 / (1 - d) - nu)) / Em + alpha * d;

  it("threshold sig = 29.08872 at eps = 0.001851101 (spec D.10)", () => {
    expectRel(sig(0), 29.08872, 1e-6);
    expectRel(eps(0), 0.001851101, 1e-6);
    const r = run({}, [leg([E, E, S], [eps(0) * (1 - 1e-6), eps(0) * (1 - 1e-6), 0], 20)]);
    expect(r.columns.d1[last(r)]).toBe(0);
  });

  it.each([
    [0.1, 0.003869294, 45.69316],
    [0.2, 0.006005749, 57.96131],
    [0.3, 0.008260467, 65.89316],
  ])("d = %f: eps = %f, sig = %f in both directions (spec D.10 closed form)", (d, e, s) => {
    expectRel(eps(d), e, 1e-6);
    expectRel(sig(d), s, 1e-6);
    const r = run({}, [leg([E, E, S], [eps(d), eps(d), 0], 120)]);
    const n = last(r);
    const c = r.columns;
    expectRel(c.d1[n], d, 1e-9);
    expectRel(c.d2[n], d, 1e-9);
    expectRel(c.sig11[n], sig(d), 1e-9);
    expectRel(c.sig22[n], sig(d), 1e-9);
    expectRel(c.sig11[n], s, 1e-6);
    expectRel(c.dp1[n], d, 1e-9); // both families open: Dp = D
  });
});

describe("D.11 pure shear, fixed frame [s,s,e]", () => {
  const tau = (d: number) =>
    ((1 - d) * Math.sqrt((2 * Em) / k6) * (sY0 + d / a)) / Math.sqrt(1 + b);
  const gam = (d: number) => tau(d) * (1 / G12 + (2 * k6 * d) / (Em * (1 - d)));
  const dPeak = uniaxial().dPeak;

  it("threshold tau0 = 29.08872, gamma0 = 0.006875517: the product is elastic up to it (spec D.11)", () => {
    // shear strain to gamma0·(1 − 1e-6): no damage, tau on the elastic line
    const below = run({}, [leg([S, S, E], [0, 0, 0.006875517 * (1 - 1e-6)], 20)]);
    const nb = last(below);
    expect(below.columns.d1[nb]).toBe(0);
    expect(below.columns.d2[nb]).toBe(0);
    expectRel(below.columns.sig12[nb], 29.08872 * (1 - 1e-6), 1e-6);
    // just above gamma0 both families grow
    const above = run({}, [leg([S, S, E], [0, 0, 0.006875517 * (1 + 1e-4)], 20)]);
    const na = last(above);
    expect(above.columns.d1[na]).toBeGreaterThan(0);
    expect(above.columns.d2[na]).toBeGreaterThan(0);
  });

  it.each([
    [0.05, 0.009328972, 37.93298],
    [0.1, 0.0117233, 45.69316],
    [0.2, 0.01633455, 57.96131],
    [0.3, 0.02070928, 65.89316],
    [dPeak, 0.02615795, 69.72366],
  ])("d = %f: gamma = %f, tau = %f; eps11 = eps22 = 0 (spec D.11 closed form)", (d, g, t) => {
    expectRel(gam(d), g, 1e-6);
    expectRel(tau(d), t, 1e-6);
    const r = run({}, [leg([S, S, E], [0, 0, gam(d)], 150)]);
    const n = last(r);
    const c = r.columns;
    expectRel(c.sig12[n], tau(d), 1e-9);
    expectRel(c.d1[n], d, 1e-9);
    expectRel(c.d2[n], d, 1e-9);
    for (let i = 0; i <= n; i++) {
      expect(c.eps11[i]).toBe(0);
      expect(c.eps22[i]).toBe(0);
    }
  });

  it("no residual strain after unloading (spec D.11)", () => {
    const r = run({}, [leg([S, S, E], [0, 0, gam(0.3)], 150), leg([S, S, S], [0, 0, 0], 30)]);
    const n = last(r);
    expect(Math.abs(r.columns.gam12[n])).toBeLessThan(1e-15);
    expect(r.columns.eps11[n]).toBe(0);
    expect(r.columns.dp1[n]).toBe(0);
  });
});

describe("D.12 shear strain continuous when the normal stress changes sign", () => {
  const U = uniaxial();
  const d1 = U.dOfEps(0.01);
  const d2 = U.d2OfD1(d1);
  const epsP = alpha * d1;
  const tauV = 20;
  const w1 = d1 / (1 - d1);
  const w2 = d2 / (1 - d2);
  const gamma = tauV * (1 / G12 + k6 * (w1 / Em + w2 / Em)); // tau·S66 (spec B.3)
  const legs: Leg[] = [
    leg([E, S, S], [0.01, 0, 0], 100),
    leg([S, S, S], [0, 0, 0], 50),
    leg([S, S, S], [0, 0, tauV], 20),
    leg([S, S, S], [10, 0, tauV], 10),
    leg([S, S, S], [-10, 0, tauV], 40),
  ];
  const r = run({}, legs);
  const c = r.columns;

  it("gamma12 stays tau·S66 = 0.005502171 through the sweep, no damage growth (spec D.12)", () => {
    expectRel(gamma, 0.005502171, 1e-6);
    for (let i = 170; i < r.rows; i++) {
      expectRel(c.gam12[i], gamma, 1e-12);
      expect(c.d1[i]).toBe(c.d1[150]);
      expect(c.d2[i]).toBe(c.d2[150]);
    }
    expectRel(c.d1[150], d1, 1e-12);
  });

  it("eps11 = 0.002490229 (sig11 = 10), 0.001271212 (0), 0.0003621214 (−10) (spec D.12)", () => {
    expect(c.sig11[180]).toBe(10);
    expectRel(c.eps11[180], 10 / (Em * (1 - d1)) + epsP, 1e-9);
    expectRel(c.eps11[180], 0.002490229, 1e-6);
    expect(Math.abs(c.sig11[200])).toBeLessThan(1e-12);
    expectRel(c.eps11[200], epsP, 1e-9);
    expectRel(c.eps11[200], 0.001271212, 1e-6);
    expect(c.sig11[220]).toBe(-10);
    expectRel(c.eps11[220], -10 / Em + epsP, 1e-9);
    expectRel(c.eps11[220], 0.0003621214, 1e-6);
  });

  it("the negative control: switching shear with H(s11) would jump by k6·w1·tau/E1 = 6.20e-4", () => {
    // The product's share of family 1 in gamma12: the same path with b = 0 (no family 2) minus
    // the same path with k6 = 0 (cracks carry no shear compliance); d1 is the same in both.
    const withCracks = run({ b: 0 }, legs).columns;
    const withoutShearTerm = run({ b: 0, k6: 0 }, legs).columns;
    expectRel(withCracks.d1[150], d1, 1e-12);
    const jump = withCracks.gam12[200] - withoutShearTerm.gam12[200];
    expectRel(jump, (k6 * w1 * tauV) / Em, 1e-9);
    expectRel(jump, 6.2e-4, 2e-3);
    // across the closure point the computed gamma changes by far less than that jump
    expect(Math.abs(c.gam12[201] - c.gam12[199])).toBeLessThan(1e-12 * jump);
  });
});

describe("D.13 pure shear, frame 'onset'", () => {
  const onset = { frame: "onset" as const };
  const tau = (d: number) => (1 - d) * Math.sqrt(2 * Em) * (sY0 + d / a);
  const gam = (d: number) => (tau(d) * (1 / (1 - d) + 1 + 2 * nu)) / Em + alpha * d;
  const exx = (d: number) => 0.5 * ((tau(d) * d) / (Em * (1 - d)) + alpha * d);
  const dPeak = uniaxial().dPeak;

  it.each([
    [0.1, 0.01334037, 52.09822],
    [0.3, 0.02218508, 75.12976],
    [dPeak, 0.02647204, 79.49721],
  ])("d1 = %f: gamma = %f, tau = %f, frame locked at 45° (spec D.13 closed form)", (d, g, t) => {
    expectRel(gam(d), g, 1e-6);
    expectRel(tau(d), t, 1e-6);
    const r = run(onset, [leg([S, S, E], [0, 0, gam(d)], 200)]);
    const n = last(r);
    const c = r.columns;
    expectRel(c.thetaD[n], 45, 1e-12);
    expect(c.thetaD[0]).toBe(0); // the parameter's value until the frame locks
    expectRel(c.sig12[n], tau(d), 1e-9);
    expectRel(c.d1[n], d, 1e-9);
    expectRel(c.eps11[n], exx(d), 1e-9);
    expectRel(c.eps22[n], exx(d), 1e-9);
  });

  it("eps_xx = 0.0005131223 at d = 0.1; d2 = 0.1036374 at d1 = 0.3 (spec D.13)", () => {
    // the product's eps_xx at the spec's shear strain for d1 = 0.1
    const r1 = run(onset, [leg([S, S, E], [0, 0, 0.01334037], 200)]);
    expectRel(r1.columns.d1[last(r1)], 0.1, 1e-6);
    expectRel(r1.columns.eps11[last(r1)], 0.0005131223, 1e-6);
    expectRel(r1.columns.eps22[last(r1)], 0.0005131223, 1e-6);
    const r = run(onset, [leg([S, S, E], [0, 0, gam(0.3)], 200)]);
    const d2 = uniaxial().d2OfD1(0.3);
    expectRel(d2, 0.1036374, 1e-6);
    expectRel(r.columns.d2[last(r)], d2, 1e-9);
    expect(r.columns.dp2[last(r)]).toBe(0); // family 2 closed: no open growth
  });

  it("after unloading: gamma_p = alpha·d1, eps_p,xx = eps_p,yy = alpha·d1/2 (spec D.13)", () => {
    const r = run(onset, [leg([S, S, E], [0, 0, gam(0.3)], 200), leg([S, S, S], [0, 0, 0], 50)]);
    const n = last(r);
    const c = r.columns;
    expectRel(c.gam12[n], alpha * 0.3, 1e-9);
    expectRel(c.eps11[n], (alpha * 0.3) / 2, 1e-9);
    expectRel(c.eps22[n], (alpha * 0.3) / 2, 1e-9);
    expectRel(c.gam12[n], 0.0015, 1e-9);
    expectRel(c.eps11[n], 0.00075, 1e-9);
    expectRel(c.gamP12[n], 0.0015, 1e-9);
  });
});

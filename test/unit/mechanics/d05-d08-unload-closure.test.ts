/** Spec damage-law.md D.5–D.8: unloading, compression, closure continuity, memory. */
import { describe, expect, it } from "vitest";
import type { Leg } from "@/lib/mechanics/types";
import { DEMO, E, S, expectRel, last, leg, run, uniaxial } from "./helpers";

const U = uniaxial(DEMO);
const d10 = U.dOfEps(0.01); // d1 at eps = 0.01 (spec D.4)
const d2at10 = U.d2OfD1(d10);
const epsP = DEMO.alpha * d10;
const toTenAndUnload: Leg[] = [leg([E, S, S], [0.01, 0, 0], 100), leg([S, S, S], [0, 0, 0], 50)];

describe("D.5 unloading is linear with modulus E(1−d), towards the permanent strain", () => {
  const r = run({}, toTenAndUnload);
  const n = last(r);

  it("at sig = 0: eps11 = alpha·d1 = 0.001271212, eps22 = 0, d unchanged (spec D.5)", () => {
    expectRel(r.columns.eps11[n], epsP, 1e-9);
    expectRel(r.columns.eps11[n], 0.001271212, 1e-6);
    expect(Math.abs(r.columns.eps22[n])).toBeLessThanOrEqual(1e-15);
    expectRel(r.columns.d1[n], d10, 1e-12);
    expectRel(r.columns.d2[n], d2at10, 1e-12);
    expectRel(r.columns.epsP11[n], epsP, 1e-12);
    expect(r.columns.psi[n]).toBeCloseTo(0, 15);
  });

  it("on the unloading line at eps = 0.005: sig = E(1−d1)(eps − epsP) = 30.58849 (spec D.5)", () => {
    const r2 = run({}, [...toTenAndUnload, leg([E, S, S], [0.005, 0, 0], 10)]);
    const m = last(r2);
    const Eu = DEMO.E1 * (1 - d10);
    expectRel(Eu, 8203.333, 1e-6);
    expectRel(r2.columns.sig11[m], Eu * (0.005 - epsP), 1e-9);
    expectRel(r2.columns.sig11[m], 30.58849, 1e-6);
    expectRel(r2.columns.d1[m], d10, 1e-12);
  });

  it("unloading Poisson ratio nu12(1−d1) = 0.2237273 (spec D.5)", () => {
    const a = 110; // row at sig ≈ 71.6·40/50 on the unloading leg
    const b = 140;
    const c = r.columns;
    const nuU = -(c.eps22[b] - c.eps22[a]) / (c.eps11[b] - c.eps11[a]);
    expectRel(nuU, DEMO.nu12 * (1 - d10), 1e-9);
    expectRel(nuU, 0.2237273, 1e-6);
  });

  it("transverse modulus from a small sig22 cycle: E2(1−d2) = 10135.68 (spec D.5)", () => {
    const r3 = run({}, [...toTenAndUnload, leg([S, S, S], [0, 1, 0], 4)]);
    const m = last(r3);
    const E2d = 1 / (r3.columns.eps22[m] - r3.columns.eps22[n]);
    expectRel(E2d, DEMO.E2 * (1 - d2at10), 1e-9);
    expectRel(E2d, 10135.68, 1e-6);
  });
});

describe("D.6 compression after tension recovers E", () => {
  it("eps11 = −0.005: sig = E(eps − epsP) = −68.98334, slope 11000, d unchanged (spec D.6)", () => {
    const r = run({}, [...toTenAndUnload, leg([E, S, S], [-0.005, 0, 0], 100)]);
    const n = last(r);
    expectRel(r.columns.sig11[n], DEMO.E1 * (-0.005 - epsP), 1e-9);
    expectRel(r.columns.sig11[n], -68.98334, 1e-6);
    const slope =
      (r.columns.sig11[n] - r.columns.sig11[n - 50]) /
      (r.columns.eps11[n] - r.columns.eps11[n - 50]);
    expectRel(slope, 11000, 1e-9);
    expectRel(r.columns.d1[n], d10, 1e-12);
  });
});

describe("D.7 continuity at closure", () => {
  it("eps11 = epsP ∓ 1e-7 gives sig = −0.0011 and +0.00082033 (spec D.7)", () => {
    const below = run({}, [...toTenAndUnload, leg([E, S, S], [epsP - 1e-7, 0, 0], 1)]);
    const above = run({}, [...toTenAndUnload, leg([E, S, S], [epsP + 1e-7, 0, 0], 1)]);
    const sb = below.columns.sig11[last(below)];
    const sa = above.columns.sig11[last(above)];
    // closed forms: slopes E and E(1−d1) on either side of the closure point
    expectRel(sb, -DEMO.E1 * 1e-7, 1e-6);
    expectRel(sa, DEMO.E1 * (1 - d10) * 1e-7, 1e-6);
    expectRel(sb, -0.0011, 1e-5);
    expectRel(sa, 0.00082033, 1e-5);
    // continuity: both sides tend to 0 with the perturbation (no jump at closure)
    const at = run({}, [...toTenAndUnload, leg([E, S, S], [epsP, 0, 0], 1)]);
    expect(Math.abs(at.columns.sig11[last(at)])).toBeLessThan(1e-9);
  });
});

describe("D.8 memory / envelope", () => {
  it("tension 0.01 → unload → −0.005 → reload to 0.012 equals the monotonic values (spec D.8)", () => {
    const r = run({}, [
      ...toTenAndUnload,
      leg([E, S, S], [-0.005, 0, 0], 100),
      leg([E, S, S], [0.012, 0, 0], 340),
    ]);
    const c = r.columns;
    const n = last(r);
    for (let i = 100; i < n; i++) {
      if (c.eps11[i] <= 0.01 - 1e-12) expectRel(c.d1[i], d10, 1e-12);
    }
    expectRel(c.d1[n], U.dOfEps(0.012), 1e-9);
    expectRel(c.sig11[n], U.sigOfEps(0.012), 1e-9);
    expectRel(c.d1[n], 0.3270403, 1e-6);
    expectRel(c.sig11[n], 76.726, 1e-6);
  });
});

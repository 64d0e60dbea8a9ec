/** Spec damage-law.md D.4: monotonic uniaxial tension, closed forms. */
import { describe, expect, it } from "vitest";
import { DEMO, E, S, expectRel, last, leg, run, uniaxial } from "./helpers";

const U = uniaxial(DEMO);

describe("D.4 monotonic uniaxial tension [e,s,s], closed form", () => {
  it("threshold and peak: the product reaches the spec's numbers (spec D.4, 7 digits)", () => {
    // elastic up to eps0 = 0.003015113 (sig0 = 33.16625), damage just above it
    const below = run({}, [leg([E, S, S], [0.003015113 * (1 - 1e-6), 0, 0], 10)]);
    expect(below.columns.d1[last(below)]).toBe(0);
    expectRel(below.columns.sig11[last(below)], 33.16625 * (1 - 1e-6), 1e-6);
    const above = run({}, [leg([E, S, S], [0.003015113 * (1 + 1e-5), 0, 0], 10)]);
    expect(above.columns.d1[last(above)]).toBeGreaterThan(0);
    // the peak: d1 = 0.4329180, sig = 79.49721 at eps = 0.01490881
    const peak = run({}, [leg([E, S, S], [0.01490881, 0, 0], 100)]);
    const n = last(peak);
    expectRel(peak.columns.d1[n], 0.432918, 1e-6);
    expectRel(peak.columns.sig11[n], 79.49721, 1e-6);
  });

  // [eps11, d1, sig11, d2, eps22] — spec D.4 table
  const table = [
    [0.004, 0.03584882, 40.52165, 0, -0.001105136],
    [0.006, 0.1086467, 53.50297, 0, -0.001459172],
    [0.008, 0.1814446, 63.86414, 0.0387019, -0.001741749],
    [0.01, 0.2542425, 71.60515, 0.07857494, -0.001952868],
    [0.012, 0.3270403, 76.726, 0.118448, -0.002092527],
    [0.0149, 0.4325973, 79.49718, 0.1762639, -0.002168105],
  ];
  const legs = table.map(([e]) => leg([E, S, S], [e, 0, 0], 40));
  const r = run({}, legs);

  it.each(table.map((row, i) => [i, ...row]))(
    "row %i (eps %f): strain-control closed form 1e-9 and table 1e-6 (spec D.4)",
    (i, eps, d1, sig, d2, eps22) => {
      const n = 40 * (i + 1);
      const c = r.columns;
      expect(c.eps11[n]).toBe(eps);
      const dCf = U.dOfEps(eps);
      const sCf = U.sigOfEps(eps);
      expectRel(c.d1[n], dCf, 1e-9);
      expectRel(c.sig11[n], sCf, 1e-9);
      expectRel(c.d2[n], U.d2OfD1(dCf), 1e-9, 1e-15);
      expectRel(c.eps22[n], (-DEMO.nu12 * sCf) / DEMO.E1, 1e-9);
      expectRel(c.d1[n], d1, 1e-6);
      expectRel(c.sig11[n], sig, 1e-6);
      expectRel(c.d2[n], d2, 1e-6, 1e-15);
      expectRel(c.eps22[n], eps22, 1e-6);
      // s22 = 0 prescribed ⇒ Hf2 = 0 ⇒ dp2 = 0; tension ⇒ dp1 = d1 (spec C.4.4, B.7)
      expect(c.dp2[n]).toBe(0);
      expectRel(c.dp1[n], c.d1[n], 1e-15);
      expect(c.failed[n]).toBe(0);
    },
  );

  it("Y1 = 0.4190545 at eps = 0.01 (spec D.4)", () => {
    const n = 160;
    const sY1 = Math.sqrt(DEMO.Y0_1) + U.dOfEps(0.01) / DEMO.a1;
    expectRel(r.columns.Y1[n], sY1 * sY1, 1e-9);
    expectRel(r.columns.Y1[n], 0.4190545, 1e-6);
    expectRel(r.columns.Ybar2[n], DEMO.b * sY1 * sY1, 1e-9);
  });

  it("d2 starts at eps = 0.006058743, sig = 53.84465, d1 = 0.1107849 (spec D.4)", () => {
    // the spec's onset strain, driven through the product: d1 and sig there, d2 still 0
    const epsS = 0.006058743;
    const below = run({}, [leg([E, S, S], [epsS * (1 - 1e-6), 0, 0], 60)]);
    const above = run({}, [leg([E, S, S], [epsS * (1 + 1e-4), 0, 0], 60)]);
    expect(below.columns.d2[last(below)]).toBe(0);
    expectRel(below.columns.d1[last(below)], 0.1107849, 1e-5);
    expectRel(below.columns.sig11[last(below)], 53.84465, 1e-6);
    expect(above.columns.d2[last(above)]).toBeGreaterThan(0);
  });

  it("stress-control inversion d(71.60515) = 0.2542424 (spec D.4 closed form)", () => {
    const rs = run({}, [leg([S, S, S], [71.60515, 0, 0], 200)]);
    const n = last(rs);
    expectRel(rs.columns.d1[n], U.dOfSig(71.60515), 1e-9);
    expectRel(rs.columns.d1[n], 0.2542424, 1e-6);
    expectRel(rs.columns.eps11[n], U.epsOfD(U.dOfSig(71.60515)), 1e-9);
  });

  it("peak: strain control at eps(d_peak) gives sig_max (spec D.4)", () => {
    const rp = run({}, [leg([E, S, S], [U.epsOfD(U.dPeak), 0, 0], 300)]);
    const n = last(rp);
    expectRel(rp.columns.d1[n], U.dPeak, 1e-9);
    expectRel(rp.columns.sig11[n], U.sigMax, 1e-9);
  });

  it("failure flag at d1 = dcrit: eps = 0.01537811, sig = 79.42507 (spec D.4, C.7)", () => {
    expectRel(U.epsOfD(0.45), 0.01537811, 1e-6);
    expectRel(U.sigOfD(0.45), 79.42507, 1e-6);
    // just below: not failed; the closed form holds
    const ok = run({}, [leg([E, S, S], [U.epsOfD(0.45) - 1e-7, 0, 0], 300)]);
    expect(ok.status.failed).toBe(false);
    const rf = run({}, [leg([E, S, S], [0.016, 0, 0], 1600)]);
    expect(rf.status.failed).toBe(true);
    expect(rf.status.failMode).toBe("dcrit axis 1");
    const n = last(rf);
    expect(rf.status.stoppedAtIncrement).toBe(n);
    expect(rf.columns.failed[n]).toBe(1);
    expect(rf.columns.failed[n - 1]).toBe(0);
    expect(rf.columns.d1[n]).toBeGreaterThanOrEqual(0.45);
    expect(rf.columns.d1[n - 1]).toBeLessThan(0.45);
    // the stopping row is the first increment beyond eps(dcrit) (increments of 1e-5)
    expect(rf.columns.eps11[n]).toBeGreaterThanOrEqual(U.epsOfD(0.45));
    expect(rf.columns.eps11[n - 1]).toBeLessThan(U.epsOfD(0.45));
  });

  it("stress control beyond 79.49721 MPa: limit load (spec D.4, C.7)", () => {
    const rl = run({}, [leg([S, S, S], [85, 0, 0], 100)]);
    expect(rl.status.failed).toBe(true);
    expect(rl.status.failMode).toBe("limit load");
    const n = last(rl);
    expect(rl.columns.failed[n]).toBe(1);
    expect(rl.status.stoppedAtIncrement).toBe(n);
    // the failing row is the last converged sub-step: below the peak stress, below d_peak
    expect(rl.columns.sig11[n]).toBeLessThanOrEqual(U.sigMax * (1 + 1e-9));
    expect(rl.columns.sig11[n]).toBeGreaterThan(U.sigMax - 85 / 100);
    expect(rl.columns.d1[n]).toBeLessThanOrEqual(U.dPeak + 1e-6);
    expect(rl.rows).toBeLessThan(101);
  });
});

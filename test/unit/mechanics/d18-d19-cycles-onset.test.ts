/** Spec damage-law.md D.18 (loop table of cyclic tension) and D.19 (isotropy of the onset frame). */
import { describe, expect, it } from "vitest";
import type { Leg } from "@/lib/mechanics/types";
import { DEMO, E, S, expectRel, last, leg, run, uniaxial } from "./helpers";

const U = uniaxial(DEMO);

describe("D.18 cyclic tension: the loop table the identification reads", () => {
  // peaks 0.002 … 0.014, unloading to sig = 0 each time, 60 + 60 increments per cycle
  const peaks = [0.002, 0.004, 0.006, 0.008, 0.01, 0.012, 0.014];
  const legs: Leg[] = peaks.flatMap((p) => [
    leg([E, S, S], [p, 0, 0], 60),
    leg([S, S, S], [0, 0, 0], 60),
  ]);
  const r = run({}, legs);
  const c = r.columns;
  const table = peaks.map((eMax, k) => {
    const peak = 120 * k + 60;
    const valley = peak + 60;
    const mid = peak + 30; // on the unloading line
    return {
      eMax,
      sigMax: c.sig11[peak],
      d: c.d1[peak],
      sqrtY: Math.sqrt(c.Y1[peak]),
      Ek: (c.sig11[peak] - c.sig11[mid]) / (c.eps11[peak] - c.eps11[mid]),
      epsR: c.eps11[valley],
      sigValley: c.sig11[valley],
    };
  });

  it("the path runs to the end without failure", () => {
    expect(r.status.failed).toBe(false);
    expect(last(r)).toBe(120 * peaks.length);
  });

  it.each(peaks.map((p, k) => [k, p]))(
    "loop %i (peak %f): sigmax, d_k, E_k = E(1−d_k), sqrt(Y_k), eps_r = alpha·d_k (spec D.18 from D.4 closed forms)",
    (k) => {
      const row = table[k];
      const d = U.dOfEps(row.eMax);
      expectRel(row.sigMax, U.sigOfEps(row.eMax), 1e-9);
      expectRel(row.d, d, 1e-9, 1e-300);
      expectRel(row.Ek, DEMO.E1 * (1 - d), 1e-9);
      if (d > 0) expectRel(row.sqrtY, Math.sqrt(DEMO.Y0_1) + d / DEMO.a1, 1e-9);
      expectRel(row.epsR, DEMO.alpha * d, 1e-9, 1e-15);
      expect(Math.abs(row.sigValley)).toBeLessThan(1e-12);
    },
  );

  it("the first loop (0.002) is undamaged (spec D.18)", () => {
    expect(table[0].d).toBe(0);
    expectRel(table[0].Ek, DEMO.E1, 1e-12);
    expect(Math.abs(table[0].epsR)).toBeLessThan(1e-15);
  });

  it("the loop table is exactly linear: d = a·sqrt(Y) − a·sqrt(Y0), eps_r = alpha·d (spec E.5, E.6 on model output)", () => {
    const damaged = table.filter((t) => t.d > 0);
    expect(damaged.length).toBeGreaterThanOrEqual(3);
    const first = damaged[0];
    const lastRow = damaged[damaged.length - 1];
    const a = (lastRow.d - first.d) / (lastRow.sqrtY - first.sqrtY);
    const sY0 = first.sqrtY - first.d / a;
    const alpha =
      damaged.reduce((s, t) => s + t.epsR * t.d, 0) / damaged.reduce((s, t) => s + t.d * t.d, 0);
    expectRel(a, 0.6, 1e-9);
    expectRel(sY0 * sY0, 0.05, 1e-9);
    expectRel(alpha, 0.005, 1e-9);
  });
});

describe("D.19 isotropy in frame 'onset'", () => {
  const th = (30 * Math.PI) / 180;
  const c = Math.cos(th);
  const s = Math.sin(th);
  const t = 60;
  const r = run({ frame: "onset" }, [leg([S, S, S], [t * c * c, t * s * s, t * s * c], 200)]);
  const n = last(r);

  it("the damage frame locks at 30° (spec D.19)", () => {
    expect(r.status.failed).toBe(false);
    expectRel(r.columns.thetaD[n], 30, 1e-12);
  });

  it("the response is the uniaxial one (D.4) rotated by 30° (spec D.19 closed form)", () => {
    const d1 = U.dOfSig(t);
    const e1 = t / (DEMO.E1 * (1 - d1)) + DEMO.alpha * d1;
    const e2 = (-DEMO.nu12 * t) / DEMO.E1;
    // eps_L = Tmᵀ·(e1, e2, 0), Tm of spec B.8
    const expected = [c * c * e1 + s * s * e2, s * s * e1 + c * c * e2, 2 * s * c * (e1 - e2)];
    expectRel(r.columns.d1[n], d1, 1e-9);
    expectRel(r.columns.eps11[n], expected[0], 1e-9);
    expectRel(r.columns.eps22[n], expected[1], 1e-9);
    expectRel(r.columns.gam12[n], expected[2], 1e-9);
  });

  it("before the lock thetaD shows the parameter's value (scenario-file.md)", () => {
    const lockRow = Array.from(r.columns.thetaD).findIndex((v) => v !== 0);
    expect(lockRow).toBeGreaterThan(1);
    // the lock happens at the first increment above the threshold stress sqrt(2·E·Y0)
    const tLock = (lockRow * t) / 200;
    expect(tLock).toBeGreaterThan(U.sig0);
    expect(tLock - t / 200).toBeLessThanOrEqual(U.sig0);
    expect(r.columns.d1[lockRow - 1]).toBe(0);
  });
});

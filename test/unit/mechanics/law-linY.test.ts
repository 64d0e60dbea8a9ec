/**
 * The optional evolution law 'linY' (spec B.6): F(y) = min(dmax, a·<y − Y0>+), a in MPa^-1.
 * Closed forms derived here from spec B.2–B.6 for uniaxial tension (not tabulated in section D).
 */
import { describe, expect, it } from "vitest";
import { localStepFrom } from "@/lib/mechanics/single-step";
import { EPS } from "@/lib/mechanics/state";
import type { MaterialParams } from "@/lib/mechanics/types";
import { DEMO, E, S, expectRel, last, leg, run } from "./helpers";

const LIN: MaterialParams = { ...DEMO, law: "linY", a1: 2, a2: 2, Y0_1: 0.05, Y0_2: 0.05 };
const { E1: Em, a1: a, Y0_1: Y0, alpha } = LIN;

/** On the branch Y1 = Y0 + d/a, so sig(d) = (1−d)·sqrt(2E(Y0 + d/a)), eps(d) = sig/(E(1−d)) + alpha·d. */
const sigOfD = (d: number) => (1 - d) * Math.sqrt(2 * Em * (Y0 + d / a));
const epsOfD = (d: number) => sigOfD(d) / (Em * (1 - d)) + alpha * d;

describe("law 'linY' in uniaxial tension (spec B.6, closed form derived from B.3–B.6)", () => {
  it.each([0.05, 0.15, 0.25])("d1 = %f: strain control reproduces sig(d) and d", (d) => {
    const r = run(LIN, [leg([E, S, S], [epsOfD(d), 0, 0], 200)]);
    const n = last(r);
    expectRel(r.columns.d1[n], d, 1e-9);
    expectRel(r.columns.sig11[n], sigOfD(d), 1e-9);
    expectRel(r.columns.Y1[n], Y0 + d / a, 1e-9);
  });

  it("peak at d_peak = (1 − 2·a·Y0)/3 (spec B.6); beyond it stress control is a limit load", () => {
    const dPeak = (1 - 2 * a * Y0) / 3;
    const sMax = sigOfD(dPeak);
    expect(sigOfD(dPeak - 1e-4)).toBeLessThan(sMax);
    expect(sigOfD(dPeak + 1e-4)).toBeLessThan(sMax);
    const below = run(LIN, [leg([S, S, S], [0.995 * sMax, 0, 0], 200)]);
    expect(below.status.failed).toBe(false);
    const beyond = run(LIN, [leg([S, S, S], [1.01 * sMax, 0, 0], 200)]);
    expect(beyond.status.failMode).toBe("limit load");
  });

  it("consistent tangent equals central differences (spec D.17 applied to 'linY')", () => {
    const r = run(LIN, [leg([E, E, E], [0.006, 0.002, 0.003], 60)]);
    expect(r.columns.d1[last(r)]).toBeGreaterThan(0);
    const st = localStepFrom(LIN, null, [E, E, E], [0, 0, 0]).state;
    // walk to the same point with a few single steps (each below the 0.05 damage cap)
    let s = st;
    for (let k = 1; k <= 60; k++) {
      s = localStepFrom(
        LIN,
        s,
        [E, E, E],
        [(0.006 * k) / 60, (0.002 * k) / 60, (0.003 * k) / 60],
      ).state;
    }
    const eps = [s[EPS] + 1e-4, s[EPS + 1], s[EPS + 2] + 1e-4];
    const step = localStepFrom(LIN, s, [E, E, E], eps);
    const h = 1e-8;
    const scale = Math.max(...Array.from(step.tangent, Math.abs));
    for (let k = 0; k < 3; k++) {
      const p = [...eps];
      const m = [...eps];
      p[k] += h;
      m[k] -= h;
      const sp = localStepFrom(LIN, s, [E, E, E], p).state;
      const sm = localStepFrom(LIN, s, [E, E, E], m).state;
      for (let i = 0; i < 3; i++) {
        const fd = (sp[7 + i] - sm[7 + i]) / (2 * h);
        expect(Math.abs(step.tangent[3 * i + k] - fd)).toBeLessThanOrEqual(1e-6 * scale);
      }
    }
  });
});

/**
 * Spec damage-law.md D.20 / D.15: over random paths with onFailure 'continue', dissipation and
 * damage never decrease (the break rule of C.7 must not release energy); tangent after a break.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { PathRun } from "@/lib/mechanics/driver";
import { localStepFrom } from "@/lib/mechanics/single-step";
import { BROKEN } from "@/lib/mechanics/state";
import type { Leg } from "@/lib/mechanics/types";
import { DEMO, E, S, leg } from "./helpers";

const component = fc.double({ min: -0.03, max: 0.03, noNaN: true });
const segment = fc.tuple(component, component, component);

describe("random all-strain paths with onFailure 'continue' (D.20, D.15)", () => {
  it("Phi and damage never decrease on any row (500 paths)", () => {
    let broke = 0;
    fc.assert(
      fc.property(fc.array(segment, { minLength: 2, maxLength: 6 }), (segs) => {
        const legs: Leg[] = segs.map((t) => leg([E, E, E], [t[0], t[1], t[2]], 15));
        const run = new PathRun({ ...DEMO, onFailure: "continue" }, legs);
        while (!run.done) run.advance(1 << 20);
        const c = run.columns;
        for (let i = 1; i < run.rows; i++) {
          // C.5 waives the dissipation post-check only at hmin: 1e-6·(1 + W) there (D.20)
          if (!(c.Phi[i] >= c.Phi[i - 1] - 1e-6 * (1 + c.W[i]))) return false;
          if (!(c.d1[i] >= c.d1[i - 1] && c.d2[i] >= c.d2[i - 1])) return false;
          if (!(c.dp1[i] >= c.dp1[i - 1] && c.dp2[i] >= c.dp2[i - 1])) return false;
        }
        if (run.status.failMode?.startsWith("dcrit")) broke++;
        return true;
      }),
      { numRuns: 500, seed: 17 },
    );
    // the property is only meaningful if many of these paths broke a family
    expect(broke).toBeGreaterThan(50);
  });
});

describe("tangent after a break (C.6 with the broken family neither evolving nor coupling)", () => {
  it("equals central differences in a step where the surviving family 2 loads", () => {
    const run = new PathRun({ ...DEMO, onFailure: "continue" }, [
      leg([E, S, S], [0.0175, 0, 0], 20),
      leg([S, S, S], [0, 0, 0], 5),
      leg([S, E, S], [0, 0.012, 0], 20),
    ]);
    while (!run.done) run.advance(1000);
    expect(run.status.failMode).toBe("dcrit axis 1");
    expect(run.status.stoppedAtIncrement).toBeNull();
    const st = run.currentState();
    expect(st[BROKEN]).toBe(1);
    const eps = [st[10], st[11] + 0.0003, st[12] + 0.0001];
    const base = localStepFrom(DEMO, st, [E, E, E], eps);
    expect(base.ok).toBe(true);
    expect(base.state[1]).toBeGreaterThan(st[1]); // family 2 grows in this step
    expect(base.state[0]).toBe(DEMO.dmax);
    const h = 1e-8;
    const scale = Math.max(...Array.from(base.tangent, Math.abs));
    for (let k = 0; k < 3; k++) {
      const plus = [...eps];
      const minus = [...eps];
      plus[k] += h;
      minus[k] -= h;
      const sp = localStepFrom(DEMO, st, [E, E, E], plus);
      const sm = localStepFrom(DEMO, st, [E, E, E], minus);
      expect(sp.ok && sm.ok).toBe(true);
      for (let i = 0; i < 3; i++) {
        const fd = (sp.state[7 + i] - sm.state[7 + i]) / (2 * h);
        expect(Math.abs(base.tangent[3 * i + k] - fd)).toBeLessThanOrEqual(1e-6 * scale);
      }
    }
  });
});

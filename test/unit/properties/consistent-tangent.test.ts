/**
 * The consistent tangent (spec C.6) equals central differences of the stress after one
 * strain-controlled step (spec D.17: h = 1e-8, 1e-6 relative — here relative to the largest
 * entry of Ct). States come from random preloading paths on random admissible, rotated sets.
 * A comparison is only meaningful where ±h does not change what is active (closure regime,
 * which families grow, which grow open): such samples are skipped and counted, and the test
 * demands enough damaging samples so it cannot pass by skipping everything.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { PathRun } from "@/lib/mechanics/driver";
import { localStepFrom } from "@/lib/mechanics/single-step";
import * as Layout from "@/lib/mechanics/state";
import type { ControlKind, MaterialParams } from "@/lib/mechanics/types";
import { admissibleParams, mixedPath, thresholdScale } from "./arbitraries";

const H = 1e-8;
const REL = 1e-6;
const ALL_STRAIN: ControlKind[] = ["strain", "strain", "strain"];

/** What the step switched on: regime, growth and open growth per family. */
function signature(from: Float64Array, to: Float64Array, dmax: number): string {
  const parts = [to[Layout.REGIME]];
  for (const i of [0, 1]) {
    parts.push(to[Layout.D1 + i] > from[Layout.D1 + i] ? 1 : 0);
    parts.push(to[Layout.DP1 + i] > from[Layout.DP1 + i] ? 1 : 0);
    parts.push(to[Layout.D1 + i] >= dmax ? 1 : 0);
  }
  return parts.join(",");
}

type Outcome = "damaging" | "elastic" | "skipped";

function compare(params: MaterialParams, state: Float64Array, step: number[]): Outcome {
  const target = [0, 1, 2].map((k) => state[Layout.EPS + k] + step[k]);
  const base = localStepFrom(params, state, ALL_STRAIN, target);
  if (!base.ok) return "skipped"; // e.g. Δd > 0.05: the driver would sub-step
  const sig = signature(state, base.state, params.dmax);
  const fd = new Float64Array(9);
  for (let j = 0; j < 3; j++) {
    const plus = [...target];
    const minus = [...target];
    plus[j] += H;
    minus[j] -= H;
    const p = localStepFrom(params, state, ALL_STRAIN, plus);
    const m = localStepFrom(params, state, ALL_STRAIN, minus);
    if (!p.ok || !m.ok) return "skipped";
    if (
      signature(state, p.state, params.dmax) !== sig ||
      signature(state, m.state, params.dmax) !== sig
    ) {
      return "skipped";
    }
    for (let i = 0; i < 3; i++)
      fd[3 * i + j] = (p.state[Layout.SIG + i] - m.state[Layout.SIG + i]) / (2 * H);
  }
  const scale = Math.max(...base.tangent.map(Math.abs));
  for (let k = 0; k < 9; k++) {
    if (Math.abs(base.tangent[k] - fd[k]) > REL * scale) {
      throw new Error(
        `Ct[${Math.floor(k / 3)}][${k % 3}] = ${base.tangent[k]}, central difference ${fd[k]} (scale ${scale})`,
      );
    }
  }
  const grew = base.state[Layout.D1] > state[Layout.D1] || base.state[Layout.D2] > state[Layout.D2];
  return grew ? "damaging" : "elastic";
}

const sample = admissibleParams({ rotated: true }).chain((params) =>
  fc.record({
    params: fc.constant(params),
    preload: mixedPath(params, {
      legs: [1, 2],
      increments: [10, 20],
      controls: ["strain"],
      strainReach: 2,
    }),
    step: fc.tuple(...[0, 1, 2].map(() => fc.integer({ min: -1000, max: 1000 }))),
  }),
);

describe("consistent tangent against central differences (spec C.6, D.17)", () => {
  it("agrees on random damaged states for damaging and elastic strain steps", () => {
    const counts: Record<Outcome, number> = { damaging: 0, elastic: 0, skipped: 0 };
    fc.assert(
      fc.property(sample, ({ params, preload, step }) => {
        const run = new PathRun(params, preload);
        while (!run.done) run.advance(1000);
        if (run.status.failed) return;
        // Steps of ~0.05 threshold strains (larger ones often break Δd <= 0.05 and would be
        // sub-stepped): along the preload's direction, so damage tends to grow, plus a random part.
        const state = run.currentState();
        const size = 0.05 * thresholdScale(params).strain;
        const eps = [0, 1, 2].map((k) => state[Layout.EPS + k]);
        const norm = Math.hypot(...eps) || 1;
        const increment = step.map((k, i) => (eps[i] / norm) * size + (k / 1000) * size);
        counts[compare(params, state, increment)]++;
      }),
      { numRuns: 150, seed: 31 },
    );
    expect(counts.damaging).toBeGreaterThanOrEqual(30);
    expect(counts.elastic).toBeGreaterThanOrEqual(5);
  });
});

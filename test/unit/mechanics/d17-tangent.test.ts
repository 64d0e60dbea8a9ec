/** Spec damage-law.md D.17: consistent tangent (C.6) against central differences, h = 1e-8. */
import { describe, expect, it } from "vitest";
import { PathRun } from "@/lib/mechanics/driver";
import { localStepFrom } from "@/lib/mechanics/single-step";
import { D1, D2, EPS } from "@/lib/mechanics/state";
import type { Leg, MaterialParams } from "@/lib/mechanics/types";
import { DEMO, E, S, SET_A, leg } from "./helpers";

const H = 1e-8;

function stateAfter(p: MaterialParams, legs: Leg[]): Float64Array {
  const run = new PathRun(p, legs);
  while (!run.done) run.advance(1000);
  expect(run.status.failed).toBe(false);
  return run.currentState();
}

/** Central differences of sig^{n+1} with respect to eps^{n+1} (all-strain step from `st`). */
function fdTangent(p: MaterialParams, st: Float64Array, eps: number[]): number[] {
  const out = new Array<number>(9).fill(0);
  for (let k = 0; k < 3; k++) {
    const plus = [...eps];
    const minus = [...eps];
    plus[k] += H;
    minus[k] -= H;
    const sp = localStepFrom(p, st, [E, E, E], plus);
    const sm = localStepFrom(p, st, [E, E, E], minus);
    expect(sp.ok && sm.ok).toBe(true);
    for (let i = 0; i < 3; i++) out[3 * i + k] = (sp.state[7 + i] - sm.state[7 + i]) / (2 * H);
  }
  return out;
}

function expectTangent(ct: Float64Array, fd: number[], rel: number) {
  const scale = Math.max(...Array.from(ct, Math.abs));
  for (let k = 0; k < 9; k++) expect(Math.abs(ct[k] - fd[k])).toBeLessThanOrEqual(rel * scale);
}

const ORTHO_ROTATED: MaterialParams = {
  ...SET_A,
  thetaD: (0.3 * 180) / Math.PI, // 0.3 rad, as in the spec's reference check (C.5)
  dcrit: 0.9,
};

describe("D.17 consistent tangent equals central differences", () => {
  it("uniaxial damaging step, demo set (spec D.17, 1e-6 relative)", () => {
    const st = stateAfter(DEMO, [leg([E, E, E], [0.008, -0.002, 0], 80)]);
    const eps = [0.0081, -0.002, 0];
    const step = localStepFrom(DEMO, st, [E, E, E], eps);
    expect(step.ok).toBe(true);
    expect(step.state[D1]).toBeGreaterThan(st[D1]); // really a damaging step
    expectTangent(step.tangent, fdTangent(DEMO, st, eps), 1e-6);
  });

  it("rotated (0.3 rad), orthotropic, two-family loading step (spec D.17, C.5 reference)", () => {
    const st = stateAfter(ORTHO_ROTATED, [leg([E, E, E], [0.006, 0.005, 0.004], 100)]);
    const eps = [st[EPS] + 1e-4, st[EPS + 1] + 8e-5, st[EPS + 2] + 5e-5];
    const step = localStepFrom(ORTHO_ROTATED, st, [E, E, E], eps);
    expect(step.ok).toBe(true);
    expect(step.state[D1]).toBeGreaterThan(st[D1]);
    expect(step.state[D2]).toBeGreaterThan(st[D2]);
    const fd = fdTangent(ORTHO_ROTATED, st, eps);
    expectTangent(step.tangent, fd, 1e-6);
    // non-symmetric in general (non-associated law, spec C.6)
    expect(Math.abs(step.tangent[1] - step.tangent[3])).toBeGreaterThan(1e-6);
  });

  it("one family closed while it grows through coupling (Hf2 = 0), rotated frame", () => {
    const st = stateAfter(ORTHO_ROTATED, [leg([E, E, E], [0.012, -0.004, 0.002], 120)]);
    const eps = [st[EPS] + 1e-4, st[EPS + 1], st[EPS + 2] + 2e-5];
    const step = localStepFrom(ORTHO_ROTATED, st, [E, E, E], eps);
    expect(step.ok).toBe(true);
    expect(step.state[D1]).toBeGreaterThan(st[D1]);
    expect(step.state[14]).toBeLessThan(0); // sig_D,22 < 0: family 2 closed
    expectTangent(step.tangent, fdTangent(ORTHO_ROTATED, st, eps), 1e-6);
  });

  it("elastic (unloading) step: Ct = Csec and equals central differences (spec D.17)", () => {
    const st = stateAfter(ORTHO_ROTATED, [
      leg([E, E, E], [0.006, 0.005, 0.004], 100),
      leg([E, E, E], [0.004, 0.003, 0.002], 10),
    ]);
    const eps = [st[EPS] - 1e-4, st[EPS + 1] - 1e-4, st[EPS + 2]];
    const step = localStepFrom(ORTHO_ROTATED, st, [E, E, E], eps);
    expect(step.ok).toBe(true);
    expect(step.state[D1]).toBe(st[D1]);
    const fd = fdTangent(ORTHO_ROTATED, st, eps);
    expectTangent(step.tangent, fd, 1e-6);
    // Csec is symmetric
    expect(Math.abs(step.tangent[1] - step.tangent[3])).toBeLessThan(1e-9 * step.tangent[0]);
  });

  it("PathRun.tangent is the tangent of the last accepted increment", () => {
    const legs = [leg([E, E, E], [0.006, 0.005, 0.004], 100)];
    const st = stateAfter(ORTHO_ROTATED, legs);
    const target: [number, number, number] = [st[EPS] + 1e-4, st[EPS + 1] + 8e-5, st[EPS + 2]];
    const run = new PathRun(ORTHO_ROTATED, [...legs, leg([E, E, E], target, 1)]);
    while (!run.done) run.advance(50);
    const single = localStepFrom(ORTHO_ROTATED, st, [E, E, E], target);
    for (let k = 0; k < 9; k++) {
      expect(Math.abs(run.tangent[k] - single.tangent[k])).toBeLessThanOrEqual(1e-9 * 1e4);
    }
  });

  it("after a mixed-control step, Ct is the strain-control tangent at the same state", () => {
    // [e,s,s] with sig22 = 10 MPa held: both families open; the row's tangent is still the
    // load-frame strain-control Ct. (At sig22 = 0 exactly the response has a closure kink and
    // central differences are not defined, so the held stress is kept away from zero.)
    const st = stateAfter(DEMO, [leg([E, S, S], [0.008, 10, 0], 80)]);
    const step = localStepFrom(DEMO, st, [E, S, S], [0.0081, 10, 0]);
    expect(step.ok).toBe(true);
    expect(step.state[D2]).toBeGreaterThan(st[D2]);
    const eps = Array.from(step.state.subarray(EPS, EPS + 3));
    expectTangent(step.tangent, fdTangent(DEMO, st, eps), 1e-6);
  });
});

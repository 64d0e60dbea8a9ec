/** Spec damage-law.md D.9 (energy balance, closed form) and D.15 (dissipation along random paths). */
import { describe, expect, it } from "vitest";
import type { Leg } from "@/lib/mechanics/types";
import { DEMO, E, S, expectRel, last, leg, run, uniaxial } from "./helpers";

const U = uniaxial(DEMO);

/** Phi(d*) of spec D.9: ∫ Y1 dd1 + ∫ alpha·<s>+ dd1 along the uniaxial branch. */
function phiClosedForm(d: number) {
  const { a1: a, Y0_1: Y0, alpha, E1 } = DEMO;
  const sY0 = Math.sqrt(Y0);
  const fromY = (a / 3) * ((sY0 + d / a) ** 3 - Y0 ** 1.5);
  const fromZ =
    alpha * Math.sqrt(2 * E1) * (sY0 * d + ((1 / a - sY0) * d * d) / 2 - d ** 3 / (3 * a));
  return { fromY, fromZ, total: fromY + fromZ };
}

describe("D.9 energy balance", () => {
  const d = U.dOfEps(0.01);
  const sig = U.sigOfEps(0.01);
  const phi = phiClosedForm(d);
  const psi = (sig * sig) / (2 * DEMO.E1 * (1 - d));

  it("the product's energies reach the spec's table values (spec D.9, 4000 increments)", () => {
    // the closed form itself (phiClosedForm) must give the spec's numbers, and so must the run
    expectRel(phi.total, 0.1219973, 1e-6);
    const r = run({}, [leg([E, S, S], [0.01, 0, 0], 4000), leg([S, S, S], [0, 0, 0], 10)]);
    const c = r.columns;
    const k = 4000;
    expectRel(c.W[k], 0.4345104, 1e-5);
    expectRel(c.psi[k], 0.3125131, 1e-6);
    expectRel(c.Phi[k], 0.1219973, 1e-5);
    expectRel(c.Phi[last(r)], 0.1219973, 1e-5);
    expectRel(c.W[last(r)], 0.1219973, 1e-5);
    expect(Math.abs(c.psi[last(r)])).toBeLessThan(1e-15);
  });

  it("monotonic to 0.01 (200 increments): W = psi + Phi (spec D.9, energies 1e-4)", () => {
    const r = run({}, [leg([E, S, S], [0.01, 0, 0], 200)]);
    const n = last(r);
    expectRel(r.columns.psi[n], psi, 1e-9); // algebraic: psi = sig²/(2E(1−d))
    expectRel(r.columns.Phi[n], phi.total, 1e-4);
    expectRel(r.columns.W[n], psi + phi.total, 1e-4);
    expectRel(r.columns.W[n], 0.4345104, 1e-4);
  });

  it("after unloading to sig = 0: W = Phi = 0.1219973, psi = 0 (spec D.9)", () => {
    const r = run({}, [leg([E, S, S], [0.01, 0, 0], 200), leg([S, S, S], [0, 0, 0], 200)]);
    const n = last(r);
    expectRel(r.columns.W[n], phi.total, 1e-4);
    expectRel(r.columns.Phi[n], phi.total, 1e-4);
    expect(Math.abs(r.columns.psi[n])).toBeLessThan(1e-15);
    // Omitting the frozen force Z would miss phi.fromZ (57 % of Phi): the check above would fail.
    expect(phi.fromZ / phi.total).toBeGreaterThan(0.5);
  });

  it.each([
    [100, 0.1219914],
    [1000, 0.1219972],
    [4000, 0.1219973],
  ])("trapezoid work with %i increments: %f (spec D.9)", (n, expected) => {
    const r = run({}, [leg([E, S, S], [0.01, 0, 0], n), leg([S, S, S], [0, 0, 0], 50)]);
    expectRel(r.columns.W[last(r)], expected, 1e-6);
  });
});

/** Deterministic generator (mulberry32) so the random paths are reproducible. */
function mulberry32(seed: number) {
  let t = seed >>> 0;
  return () => {
    t = (t + 0x6d2b79f5) >>> 0;
    let x = Math.imul(t ^ (t >>> 15), 1 | t);
    x = (x + Math.imul(x ^ (x >>> 7), 61 | x)) ^ x;
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

describe("D.15 dissipation sign along arbitrary paths", () => {
  const cases: [string, number, Partial<typeof DEMO>][] = [
    ["demo set", 11, {}],
    ["demo set", 12, {}],
    ["demo set, dcrit 0.9", 13, { dcrit: 0.9 }],
    [
      "orthotropic, rotated 25°",
      14,
      { E1: 9000, E2: 6000, nu12: 0.35, G12: 2500, thetaD: 25, dcrit: 0.9 },
    ],
  ];
  it.each(cases)(
    "%s, seed %i: every dPhi ≥ −1e-14 and |W − psi − Phi| ≤ 1e-4·W (spec D.15)",
    (_, seed, p) => {
      const rnd = mulberry32(seed);
      const legs: Leg[] = [];
      for (let s = 0; s < 12; s++) {
        const t = () => (2 * rnd() - 1) * 0.01;
        legs.push(leg([E, E, E], [t(), t(), t()], 400));
      }
      const r = run(p, legs);
      const c = r.columns;
      expect(r.rows).toBeGreaterThan(400);
      // worst values over all increments, asserted once (one expect per row would be slow)
      let growth = 0;
      let minDPhi = Infinity;
      let minDd = Infinity;
      let maxDpOverD = -Infinity;
      let maxBalance = -Infinity;
      for (let i = 1; i < r.rows; i++) {
        minDPhi = Math.min(minDPhi, c.Phi[i] - c.Phi[i - 1]);
        minDd = Math.min(minDd, c.d1[i] - c.d1[i - 1], c.d2[i] - c.d2[i - 1]);
        maxDpOverD = Math.max(maxDpOverD, c.dp1[i] - c.d1[i], c.dp2[i] - c.d2[i]);
        growth += c.d1[i] - c.d1[i - 1];
        maxBalance = Math.max(maxBalance, Math.abs(c.W[i] - c.psi[i] - c.Phi[i]) - 1e-4 * c.W[i]);
      }
      expect(minDPhi).toBeGreaterThanOrEqual(-1e-14);
      expect(minDd).toBeGreaterThanOrEqual(0);
      expect(maxDpOverD).toBeLessThanOrEqual(1e-15);
      expect(maxBalance).toBeLessThanOrEqual(1e-15);
      expect(growth).toBeGreaterThan(0); // the path really damages
    },
  );
});

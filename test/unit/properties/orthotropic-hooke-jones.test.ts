/**
 * Undamaged response against the plane-stress reduced stiffness of an orthotropic lamina:
 * Jones, Mechanics of Composite Materials, 2nd ed. (1999), ch. 2 — Q11 = E1/(1−nu12·nu21),
 * Q22 = E2/(1−nu12·nu21), Q12 = nu12·E2/(1−nu12·nu21), Q66 = G12, and for a lamina whose
 * axis 1 is at θ (counter-clockwise) from x the transformed reduced stiffness Q-bar (same
 * chapter, the standard transformation; the expanded Q-bar_ij formulas below are written from
 * memory [M] and guarded by the self-checks in the first describe block).
 * The core must give σ = Q-bar·ε for all-strain control below the damage threshold, and the
 * compliance Q-bar⁻¹ (inverted with ml-matrix) under uniaxial mixed control.
 */
import fc from "fast-check";
import { Matrix, inverse } from "ml-matrix";
import { describe, expect, it } from "vitest";
import { runPath } from "@/lib/mechanics/driver";
import type { Leg, MaterialParams } from "@/lib/mechanics/types";
import { admissibleParams } from "./arbitraries";

type Q = { Q11: number; Q22: number; Q12: number; Q66: number };

/** Jones ch. 2, reduced stiffness of the lamina in its material axes. */
function reducedStiffness(p: MaterialParams): Q {
  const nu21 = (p.nu12 * p.E2) / p.E1;
  const den = 1 - p.nu12 * nu21;
  return { Q11: p.E1 / den, Q22: p.E2 / den, Q12: (p.nu12 * p.E2) / den, Q66: p.G12 };
}

/** Jones ch. 2, transformed reduced stiffness (σx, σy, τxy) = Q-bar (εx, εy, γxy) [M]. */
function transformedStiffness({ Q11, Q22, Q12, Q66 }: Q, thetaDeg: number): number[][] {
  const t = (thetaDeg * Math.PI) / 180;
  const [c, s] = [Math.cos(t), Math.sin(t)];
  const [c2, s2] = [c * c, s * s];
  const b11 = Q11 * c2 * c2 + 2 * (Q12 + 2 * Q66) * s2 * c2 + Q22 * s2 * s2;
  const b22 = Q11 * s2 * s2 + 2 * (Q12 + 2 * Q66) * s2 * c2 + Q22 * c2 * c2;
  const b12 = (Q11 + Q22 - 4 * Q66) * s2 * c2 + Q12 * (s2 * s2 + c2 * c2);
  const b66 = (Q11 + Q22 - 2 * Q12 - 2 * Q66) * s2 * c2 + Q66 * (s2 * s2 + c2 * c2);
  const b16 = (Q11 - Q12 - 2 * Q66) * s * c2 * c + (Q12 - Q22 + 2 * Q66) * s2 * s * c;
  const b26 = (Q11 - Q12 - 2 * Q66) * s2 * s * c + (Q12 - Q22 + 2 * Q66) * s * c2 * c;
  return [
    [b11, b12, b16],
    [b12, b22, b26],
    [b16, b26, b66],
  ];
}

const times = (m: number[][], v: number[]) =>
  m.map((row) => row.reduce((sum, x, j) => sum + x * v[j], 0));

/** Damage-frame stress (spec B.8, Tm) to keep the chosen strain below every threshold. */
function maxBarYOverY0(p: MaterialParams, sigL: number[]): number {
  const t = (p.thetaD * Math.PI) / 180;
  const [c, s] = [Math.cos(t), Math.sin(t)];
  const s1 = c * c * sigL[0] + s * s * sigL[1] + 2 * s * c * sigL[2];
  const s2 = s * s * sigL[0] + c * c * sigL[1] - 2 * s * c * sigL[2];
  const s6 = -s * c * sigL[0] + s * c * sigL[1] + (c * c - s * s) * sigL[2];
  const y1 = (Math.max(s1, 0) ** 2 + p.k6 * s6 * s6) / (2 * p.E1);
  const y2 = (Math.max(s2, 0) ** 2 + p.k6 * s6 * s6) / (2 * p.E2);
  return Math.max((y1 + p.b * y2) / p.Y0_1, (p.b * y1 + y2) / p.Y0_2);
}

/** A strain along `dir` scaled so that Ybar_i <= 0.5·Y0_i: purely elastic. */
function elasticStrain(p: MaterialParams, bar: number[][], dir: number[]): number[] {
  const ratio = maxBarYOverY0(p, times(bar, dir));
  // Capped at 2 % strain: with k6 ≈ 0 pure shear drives no damage at all.
  const cap = 0.02 / Math.max(...dir.map(Math.abs));
  const scale = ratio > 0 ? Math.min(Math.sqrt(0.5 / ratio), cap) : cap;
  return dir.map((x) => x * scale);
}

function expectClose(actual: number[], expected: number[]) {
  const scale = Math.max(...expected.map(Math.abs));
  actual.forEach((a, i) => expect(Math.abs(a - expected[i])).toBeLessThanOrEqual(1e-9 * scale));
}

const direction = fc
  .tuple(...[0, 1, 2].map(() => fc.integer({ min: -1000, max: 1000 })))
  .filter((v) => v.some((x) => x !== 0));

describe("Jones ch. 2 formulas (self-checks of the reference)", () => {
  const q = reducedStiffness({ E1: 9000, E2: 6000, nu12: 0.35, G12: 2500 } as MaterialParams);
  it("reproduces spec D.1's Q11, Q22, Q12 (closed form, 7 digits)", () => {
    expect(q.Q11).toBeCloseTo(9800.363, 3);
    expect(q.Q22).toBeCloseTo(6533.575, 3);
    expect(q.Q12).toBeCloseTo(2286.751, 3);
  });
  it("Q-bar(0) = Q, Q-bar(90°) swaps axes, and the rotation invariants hold", () => {
    expectClose(transformedStiffness(q, 0).flat(), [q.Q11, q.Q12, 0, q.Q12, q.Q22, 0, 0, 0, q.Q66]);
    expectClose(transformedStiffness(q, 90).flat(), [
      q.Q22,
      q.Q12,
      0,
      q.Q12,
      q.Q11,
      0,
      0,
      0,
      q.Q66,
    ]);
    for (const theta of [17, 30, 45, -60]) {
      const b = transformedStiffness(q, theta);
      // Tsai–Pagano invariants [M]: Q11+Q22+2Q12 and Q66−Q12 do not depend on θ.
      expect(b[0][0] + b[1][1] + 2 * b[0][1]).toBeCloseTo(q.Q11 + q.Q22 + 2 * q.Q12, 6);
      expect(b[2][2] - b[0][1]).toBeCloseTo(q.Q66 - q.Q12, 6);
    }
  });
});

describe("undamaged response of the core = lamina stiffness (Jones ch. 2)", () => {
  it("all-strain control: σ = Q-bar(thetaD)·ε, d = 0, for 60 random sets, angles and strains", () => {
    fc.assert(
      fc.property(admissibleParams({ rotated: true }), direction, (p, dir) => {
        const bar = transformedStiffness(reducedStiffness(p), p.thetaD);
        const eps = elasticStrain(p, bar, dir);
        const legs: Leg[] = [
          { control: ["strain", "strain", "strain"], target: eps as Leg["target"], increments: 3 },
        ];
        const { columns: c, rows } = runPath(p, legs);
        const r = rows - 1;
        expect(rows).toBe(4);
        expect([c.d1[r], c.d2[r]]).toEqual([0, 0]);
        expectClose([c.sig11[r], c.sig22[r], c.sig12[r]], times(bar, eps));
      }),
      { numRuns: 60, seed: 41 },
    );
  });

  it("uniaxial mixed control [strain, stress, stress]: ε = Q-bar⁻¹·σ with σ = (σ11, 0, 0)", () => {
    fc.assert(
      fc.property(admissibleParams({ rotated: true }), fc.boolean(), (p, tension) => {
        const bar = transformedStiffness(reducedStiffness(p), p.thetaD);
        const compliance = inverse(new Matrix(bar)).to2DArray();
        const sigma = elasticStrain(p, bar, [...compliance.map((row) => row[0])]).map(
          (e) => e * (tension ? 1 : -1),
        );
        const eps11 = sigma[0];
        const legs: Leg[] = [
          { control: ["strain", "stress", "stress"], target: [eps11, 0, 0], increments: 2 },
        ];
        const { columns: c, rows } = runPath(p, legs);
        const r = rows - 1;
        const sig11 = eps11 / compliance[0][0];
        expectClose([c.sig11[r], c.sig22[r], c.sig12[r]], [sig11, 0, 0]);
        expectClose([c.eps11[r], c.eps22[r], c.gam12[r]], times(compliance, [sig11, 0, 0]));
      }),
      { numRuns: 40, seed: 42 },
    );
  });
});

/**
 * Convergence study: a non-proportional path (biaxial tension, then compression of axis 1 with
 * growing shear, then unloading to zero stress) on the demo set of spec A.3, run with n and 2n
 * increments per leg, n = 20, 40, 80, 160.
 *
 * What to expect, and the bounds asserted:
 * - d: the step solves d = max(d^n, F(Ybar^{n+1})) exactly (spec C.2), so along legs where Ybar
 *   only rises or only falls the damage at a leg's end does not depend on n at all. Bound:
 *   |Δd| <= 1e-9 (Newton stops at |r| <= 1e-12; the sub-step grid may differ between runs).
 * - dp (open-growth damage) is first order: in leg 2 σ22 changes sign while d2 grows, and the
 *   increment that contains the sign change assigns its whole Δd2 to "open" or "closed" by the
 *   frozen flag (spec C.4). So each run is off by at most one increment's Δd2, and
 *   |dp2(n) − dp2(2n)| <= m(n) + m(2n), with m the largest per-increment Δd2 in leg 2 (O(1/n)).
 * - σ at the end of the all-strain leg 2: same strain and same d, so only the frozen strain
 *   differs: |Δσ_i| <= (Q_i1 + Q_i2 + Q_i6)·max(alpha, beta)·(|Δdp1| + |Δdp2|), Q the undamaged
 *   reduced stiffness (damage only lowers the secant stiffness) — again O(1/n).
 * - After unloading to zero stress the residual strain differs by alpha·Δdp1 and beta·Δdp2.
 */
import { describe, expect, it } from "vitest";
import { runPath } from "@/lib/mechanics/driver";
import type { Leg } from "@/lib/mechanics/types";
import { DEMO } from "./arbitraries";

const path = (n: number): Leg[] => [
  { control: ["strain", "strain", "stress"], target: [0.005, 0.002, 0], increments: n },
  { control: ["strain", "strain", "strain"], target: [-0.003, 0.001, 0.014], increments: n },
  { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: n },
];

function solve(n: number) {
  const { columns: c, rows, status } = runPath(DEMO, path(n));
  expect(status.failed).toBe(false);
  expect(rows).toBe(3 * n + 1);
  const endOfLeg2 = 2 * n;
  let maxStepD2 = 0;
  for (let r = n + 1; r <= endOfLeg2; r++) maxStepD2 = Math.max(maxStepD2, c.d2[r] - c.d2[r - 1]);
  const pick = (r: number) => ({
    sig: [c.sig11[r], c.sig22[r], c.sig12[r]],
    d: [c.d1[r], c.d2[r]],
    dp: [c.dp1[r], c.dp2[r]],
    eps: [c.eps11[r], c.eps22[r], c.gam12[r]],
  });
  return { leg2: pick(endOfLeg2), final: pick(rows - 1), maxStepD2 };
}

/** Row sums of |Q| for the demo set (isotropic: Q11 = Q22 = E/(1−nu²), Q12 = nu·Q11, Q66 = G). */
const Q11 = DEMO.E1 / (1 - DEMO.nu12 * DEMO.nu12);
const Q_ROW_SUM = [Q11 * (1 + DEMO.nu12), Q11 * (1 + DEMO.nu12), DEMO.G12];
const FROZEN = Math.max(DEMO.alpha, DEMO.beta);

describe("convergence under halving of the increment (non-proportional path)", () => {
  const runs = [20, 40, 80, 160, 320].map((n) => ({ n, ...solve(n) }));

  it("damages both families and crosses σ22 = 0 while d2 grows (the path tests what it claims)", () => {
    const coarse = runs[0];
    expect(Math.min(...coarse.leg2.d)).toBeGreaterThan(0.1);
    expect(coarse.leg2.sig[1]).toBeLessThan(0); // σ22 ended compressive after being tensile
    expect(coarse.leg2.dp[1]).toBeLessThan(coarse.leg2.d[1]); // part of d2 grew closed
  });

  it("the largest per-increment Δd2 shrinks like 1/n", () => {
    for (let k = 1; k < runs.length; k++) {
      expect(runs[k].maxStepD2).toBeLessThan(0.6 * runs[k - 1].maxStepD2);
    }
  });

  it.each([0, 1, 2, 3])(
    "n → 2n changes d, dp, σ and the residual strain within the stated bounds (pair %i)",
    (k) => {
      const [a, b] = [runs[k], runs[k + 1]];
      const dpBound = a.maxStepD2 + b.maxStepD2;
      for (const at of ["leg2", "final"] as const) {
        for (let i = 0; i < 2; i++) {
          expect(Math.abs(a[at].d[i] - b[at].d[i])).toBeLessThanOrEqual(1e-9);
          expect(Math.abs(a[at].dp[i] - b[at].dp[i])).toBeLessThanOrEqual(dpBound);
        }
      }
      const dpChange =
        Math.abs(a.leg2.dp[0] - b.leg2.dp[0]) + Math.abs(a.leg2.dp[1] - b.leg2.dp[1]);
      for (let i = 0; i < 3; i++) {
        expect(Math.abs(a.leg2.sig[i] - b.leg2.sig[i])).toBeLessThanOrEqual(
          Q_ROW_SUM[i] * FROZEN * dpChange + 1e-9,
        );
      }
      // Unloaded to zero stress: the strains left are the frozen strains alpha·dp1, beta·dp2.
      expect(Math.abs(a.final.eps[0] - b.final.eps[0])).toBeLessThanOrEqual(
        DEMO.alpha * dpBound + 1e-12,
      );
      expect(Math.abs(a.final.eps[1] - b.final.eps[1])).toBeLessThanOrEqual(
        DEMO.beta * dpBound + 1e-12,
      );
    },
  );

  it("the coarsest bound is already small: |Δσ| < 0.5 MPa and |Δdp2| < 0.01 from n = 20 to 40", () => {
    const [a, b] = runs;
    expect(Math.max(...a.leg2.sig.map((s, i) => Math.abs(s - b.leg2.sig[i])))).toBeLessThan(0.5);
    expect(Math.abs(a.leg2.dp[1] - b.leg2.dp[1])).toBeLessThan(0.01);
  });
});

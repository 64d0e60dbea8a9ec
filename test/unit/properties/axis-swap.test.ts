/**
 * Swapping axes 1 and 2 (spec D.14 recipe): E1 ↔ E2, nu12 → nu12·E2/E1, Y0_1 ↔ Y0_2, a1 ↔ a2,
 * alpha ↔ beta (b, k6, G12 unchanged), and on the path component 11 ↔ 22 (controls and
 * targets). The response must be the swapped one: σ, ε, d, dp, Y swapped, energies equal.
 * Generalised here to rotated frames: exchanging x ↔ y is a reflection, so the damage-frame
 * angle changes sign (thetaD → −thetaD) while shear components keep theirs.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { runPath } from "@/lib/mechanics/driver";
import type { Leg, MaterialParams, ResultColumn, ResultColumns } from "@/lib/mechanics/types";
import { parameterSetSchema, toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { SET_A } from "../mechanics/helpers";
import { paramsAndPath } from "./arbitraries";

export function swapParams(p: MaterialParams): MaterialParams {
  return {
    ...p,
    E1: p.E2,
    E2: p.E1,
    nu12: (p.nu12 * p.E2) / p.E1,
    Y0_1: p.Y0_2,
    Y0_2: p.Y0_1,
    a1: p.a2,
    a2: p.a1,
    alpha: p.beta,
    beta: p.alpha,
    thetaD: p.thetaD === 0 ? 0 : -p.thetaD,
  };
}

function swapLeg(leg: Leg): Leg {
  return {
    control: [leg.control[1], leg.control[0], leg.control[2]],
    target: [leg.target[1], leg.target[0], leg.target[2]],
    increments: leg.increments,
  };
}

/** Column of A ↔ its counterpart in B. */
const PAIRS: [ResultColumn, ResultColumn][] = [
  ["eps11", "eps22"],
  ["sig11", "sig22"],
  ["d1", "d2"],
  ["dp1", "dp2"],
  ["epsP11", "epsP22"],
  ["Y1", "Y2"],
  ["Ybar1", "Ybar2"],
  ["gam12", "gam12"],
  ["sig12", "sig12"],
  ["gamP12", "gamP12"],
  ["psi", "psi"],
  ["W", "W"],
  ["Phi", "Phi"],
  ["failed", "failed"],
];

/** Tolerance: 1e-9 of each column's largest magnitude (Newton stops at |r| <= 1e-12 in d). */
function mismatch(a: ResultColumns, b: ResultColumns, rows: number): string | null {
  for (const [x, y] of [
    ...PAIRS,
    ...PAIRS.map(([p, q]) => [q, p] as [ResultColumn, ResultColumn]),
  ]) {
    let scale = 0;
    for (let r = 0; r < rows; r++) scale = Math.max(scale, Math.abs(a[x][r]));
    for (let r = 0; r < rows; r++) {
      if (Math.abs(a[x][r] - b[y][r]) > 1e-9 * scale + 1e-15) {
        return `row ${r}: A.${x} = ${a[x][r]} but B.${y} = ${b[y][r]}`;
      }
    }
  }
  return null;
}

function check(params: MaterialParams, legs: Leg[]): void {
  const swapped = swapParams(params);
  // The swapped set is admissible too (|nu21| < sqrt(E2/E1) ⇔ |nu12| < sqrt(E1/E2)).
  expect(parameterSetSchema.safeParse(swapped).success).toBe(true);
  const a = runPath(params, legs);
  const b = runPath(swapped, legs.map(swapLeg));
  expect(b.rows).toBe(a.rows);
  expect(b.status.failMode?.replace(/[12]$/, "")).toBe(a.status.failMode?.replace(/[12]$/, ""));
  const problem = mismatch(a.columns, b.columns, a.rows);
  if (problem) throw new Error(problem);
}

describe("axis swap (spec D.14)", () => {
  it("swaps the response on 60 random mixed-control paths in the fixed frame thetaD = 0", () => {
    fc.assert(
      fc.property(paramsAndPath({}, { legs: [2, 5], increments: [5, 30] }), ({ params, legs }) =>
        check(params, legs),
      ),
      { numRuns: 60, seed: 21 },
    );
  });

  it("swaps the response on 40 random paths in rotated frames with thetaD → −thetaD", () => {
    fc.assert(
      fc.property(
        paramsAndPath({ rotated: true }, { legs: [2, 5], increments: [5, 30] }),
        ({ params, legs }) => check(params, legs),
      ),
      { numRuns: 40, seed: 22 },
    );
  });

  it("the comparison notices an unswapped response (a set whose axes differ)", () => {
    // spec D.14 set A: E1 = 9000, E2 = 6000 … is not its own mirror image.
    const setA = toMaterialParams({ id: "A", ...parameterSetSchema.parse(SET_A) });
    const legs: Leg[] = [
      { control: ["strain", "strain", "strain"], target: [0.006, 0.002, 0.004], increments: 20 },
    ];
    const a = runPath(setA, legs);
    const sameSetSwappedPath = runPath(setA, legs.map(swapLeg));
    expect(mismatch(a.columns, sameSetSwappedPath.columns, a.rows)).not.toBeNull();
  });
});

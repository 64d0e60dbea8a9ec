/**
 * Energy balance W = psi + Phi on every row (spec B.7; tolerance of D.15: |W − psi − Phi| <=
 * 1e-4·W with 400 increments per leg; W by the trapezoid rule, Phi by the midpoint rule, both
 * second order, spec C.7). Paths: all-strain, and mixed with stress targets below the threshold
 * stress so stress-controlled legs stay within what the material carries.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { runPath } from "@/lib/mechanics/driver";
import type { Leg, MaterialParams, ResultColumns } from "@/lib/mechanics/types";
import { DEMO, mixedPath, paramsAndPath } from "./arbitraries";

const INCREMENTS = 400;
/** Absolute floor for rows where W is ~0 (undamaged, unloaded): round-off of sums of ~1e-3·1e2. */
const ABS_FLOOR = 1e-12;

/** Largest |W − psi − Phi| / W over the rows (with the floor), and where. */
function worstImbalance(columns: ResultColumns, rows: number): { ratio: number; row: number } {
  const { W, psi, Phi } = columns;
  let worst = { ratio: 0, row: 0 };
  for (let r = 0; r < rows; r++) {
    const ratio = Math.abs(W[r] - psi[r] - Phi[r]) / (1e-4 * W[r] + ABS_FLOOR);
    if (ratio > worst.ratio) worst = { ratio, row: r };
  }
  return worst;
}

function check(params: MaterialParams, legs: Leg[]): void {
  const { columns, rows } = runPath(params, legs);
  const { ratio, row } = worstImbalance(columns, rows);
  if (ratio > 1) {
    throw new Error(
      `row ${row}: |W − psi − Phi| = ${Math.abs(columns.W[row] - columns.psi[row] - columns.Phi[row])} > 1e-4·W (W = ${columns.W[row]})`,
    );
  }
}

const pathShape = {
  legs: [2, 4] as [number, number],
  increments: [INCREMENTS, INCREMENTS] as [number, number],
};

describe("energy balance with 400 increments per leg", () => {
  it("holds on 30 random all-strain paths for random admissible sets", () => {
    fc.assert(
      fc.property(
        paramsAndPath({ rotated: true }, { ...pathShape, controls: ["strain"] }),
        ({ params, legs }) => check(params, legs),
      ),
      { numRuns: 30, seed: 11 },
    );
  });

  it("holds on 30 random mixed-control paths for random admissible sets", () => {
    fc.assert(
      fc.property(
        paramsAndPath({ rotated: true }, { ...pathShape, stressReach: 0.6 }),
        ({ params, legs }) => check(params, legs),
      ),
      { numRuns: 30, seed: 12 },
    );
  });

  it("holds on 20 random mixed-control paths for the demo set of spec A.3", () => {
    fc.assert(
      fc.property(mixedPath(DEMO, { ...pathShape, stressReach: 0.6 }), (legs) => check(DEMO, legs)),
      { numRuns: 20, seed: 13 },
    );
  });

  it("the check detects an energy leak of 2e-4·W", () => {
    const legs: Leg[] = [
      { control: ["strain", "stress", "stress"], target: [0.01, 0, 0], increments: INCREMENTS },
    ];
    const { columns, rows } = runPath(DEMO, legs);
    expect(worstImbalance(columns, rows).ratio).toBeLessThan(1);
    columns.Phi[rows - 1] += 2e-4 * columns.W[rows - 1];
    expect(worstImbalance(columns, rows).ratio).toBeGreaterThan(1);
  });
});

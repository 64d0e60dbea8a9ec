/**
 * The calibration report's curves inside a compute worker: each set's run of the revision's
 * path and the standard tension case, reduced to SVG geometry here so only a few kilobytes come
 * back. A set whose run passes its share of the budget is left out (and named) rather than
 * holding the report.
 */
import { PathRun, runPath, type PathResult } from "@/lib/mechanics/driver";
import type { Leg } from "@/lib/mechanics/types";
import { toMaterialParams, type ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { standardLoadCases } from "@/lib/server/handoff/bundle/load-cases";
import { chartGeometry } from "@/lib/server/handoff/report/svg-chart";

/** Increments between two looks at the clock. */
const CHUNK_INCREMENTS = 8192;

function runWithin(set: ParameterSet, legs: Leg[], budgetMs: number): PathResult | null {
  const start = performance.now();
  const run = new PathRun(toMaterialParams(set), legs);
  while (!run.done) {
    run.advance(CHUNK_INCREMENTS);
    if (!run.done && performance.now() - start > budgetMs) return null;
  }
  return run.result();
}

export function reportCurvesInWorker(sets: ParameterSet[], legs: Leg[], perSetBudgetMs: number) {
  const runs = sets.flatMap((set) => {
    const run = runWithin(set, legs, perSetBudgetMs);
    return run ? [{ set, run }] : [];
  });
  const skipped = sets.filter((s) => !runs.some((r) => r.set.id === s.id)).map((s) => s.id);
  const stressStrain = chartGeometry(
    runs.map(({ set, run }) => ({
      name: set.id,
      x: run.columns.eps11.subarray(0, run.rows),
      y: run.columns.sig11.subarray(0, run.rows),
    })),
  );
  const damage = chartGeometry(
    runs.flatMap(({ set, run }) => [
      {
        name: `${set.id} d1`,
        x: run.columns.increment.subarray(0, run.rows),
        y: run.columns.d1.subarray(0, run.rows),
      },
      {
        name: `${set.id} d2`,
        x: run.columns.increment.subarray(0, run.rows),
        y: run.columns.d2.subarray(0, run.rows),
      },
    ]),
  );
  const tension = chartGeometry(
    sets.map((set) => {
      const run = runPath(toMaterialParams(set), standardLoadCases(set)[0].legs);
      return {
        name: set.id,
        x: run.columns.eps11.subarray(0, run.rows),
        y: run.columns.sig11.subarray(0, run.rows),
      };
    }),
  );
  return {
    charts: { stressStrain, damage, tension },
    statuses: runs.map(({ set, run }) => ({ setId: set.id, ...run.status })),
    skipped,
  };
}
export type ReportCurves = ReturnType<typeof reportCurvesInWorker>;

import "server-only";

/** Everything the calibration report of one revision shows, read with team:read. */
import type { Db } from "@/db/client";
import { listConformanceChecksOfRevision } from "@/db/queries/conformance-checks";
import { listFitsForTeam } from "@/db/queries/fits";
import { listParameterSetsForTeam } from "@/db/queries/parameter-sets";
import { findRevisionMeta, listReviewEvents } from "@/db/queries/revisions";
import { listTestRecordsForTeam } from "@/db/queries/test-records";
import type { Actor } from "@/lib/server/accounts/actor";
import { standardLoadCases } from "@/lib/server/handoff/bundle/load-cases";
import { runPath } from "@/lib/mechanics/driver";
import {
  budgetedRunner,
  runBudgetMs,
  TimeBudgetExceeded,
} from "@/lib/server/handoff/runs/budgeted-runner";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { listComments } from "@/lib/server/workspace/comments";
import { parseScenarioFileOrThrow } from "@/lib/server/workspace/parse";
import { revisionInTeam } from "@/lib/server/access/scope";

import { matchProvenance, type LibrarySet } from "./provenance";
import { chartGeometry } from "./svg-chart";

export async function loadCalibrationReport(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  number: unknown,
) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const { scenario, revision } = await revisionInTeam(db, ctx.team.id, scenarioId, number);
  const file = parseScenarioFileOrThrow(revision.file);
  const [meta, reviews, comments, checks, library, fits, records] = await Promise.all([
    findRevisionMeta(db, scenario.id, revision.number),
    listReviewEvents(db, revision.id),
    listComments(db, actor, teamSlug, scenario.id, revision.number),
    listConformanceChecksOfRevision(db, revision.id),
    listParameterSetsForTeam(db, ctx.team.id),
    listFitsForTeam(db, ctx.team.id),
    listTestRecordsForTeam(db, ctx.team.id),
  ]);
  const provenance = matchProvenance(
    file.parameterSets,
    library as unknown as LibrarySet[],
    fits.map((f) => ({ ...f, residuals: f.residuals ?? [], warnings: f.warnings ?? [] })),
    new Map(records.map((r) => [r.id, r.name])),
  );
  // A path may hold up to 1,000,000 increments: each set's run has the API's time budget, and a
  // set over it is left out of the charts (and said so) rather than holding the page.
  const runner = budgetedRunner(runBudgetMs());
  const runs = file.parameterSets.flatMap((set) => {
    try {
      return [{ set, run: runner(toMaterialParams(set), file.path.legs) }];
    } catch (error) {
      if (error instanceof TimeBudgetExceeded) return [];
      throw error;
    }
  });
  const skipped = file.parameterSets
    .filter((s) => !runs.some((r) => r.set.id === s.id))
    .map((s) => s.id);
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
    file.parameterSets.map((set) => {
      const run = runPath(toMaterialParams(set), standardLoadCases(set)[0].legs);
      return {
        name: set.id,
        x: run.columns.eps11.subarray(0, run.rows),
        y: run.columns.sig11.subarray(0, run.rows),
      };
    }),
  );
  return {
    team: ctx.team,
    scenario,
    revision: meta!,
    file,
    provenance,
    reviews,
    comments: comments.items,
    checks,
    charts: { stressStrain, damage, tension },
    statuses: runs.map(({ set, run }) => ({ setId: set.id, ...run.status })),
    skipped,
  };
}
export type CalibrationReport = Awaited<ReturnType<typeof loadCalibrationReport>>;

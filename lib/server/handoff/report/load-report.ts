import "server-only";

/** Everything the calibration report of one revision shows, read with team:read. */
import type { Db } from "@/db/client";
import { listConformanceChecksOfRevision } from "@/db/queries/conformance-checks";
import { listFitsForTeam } from "@/db/queries/fits";
import { listParameterSetsForTeam, listParameterSetVersionRows } from "@/db/queries/parameter-sets";
import { findRevisionMeta, listReviewEvents } from "@/db/queries/revisions";
import { listTestRecordsForTeam } from "@/db/queries/test-records";
import type { Actor } from "@/lib/server/accounts/actor";
import { compute, computeBudgetMs } from "@/lib/server/compute/pool";
import type { ReportCurves } from "@/lib/server/compute/worker/report-curves-task";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { listComments } from "@/lib/server/workspace/comments";
import { parseScenarioFileOrThrow } from "@/lib/server/workspace/parse";
import { revisionInTeam } from "@/lib/server/access/scope";

import { matchProvenance, type LibrarySet } from "./provenance";

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
  const [meta, reviews, comments, checks, library, versions, fits, records] = await Promise.all([
    findRevisionMeta(db, scenario.id, revision.number),
    listReviewEvents(db, revision.id),
    listComments(db, actor, teamSlug, scenario.id, revision.number),
    listConformanceChecksOfRevision(db, revision.id),
    listParameterSetsForTeam(db, ctx.team.id),
    listParameterSetVersionRows(db, ctx.team.id),
    listFitsForTeam(db, ctx.team.id),
    listTestRecordsForTeam(db, ctx.team.id),
  ]);
  const provenance = matchProvenance(
    file.parameterSets,
    // Every version of every library set: a revision made before an edit names the old one.
    library.map((l): LibrarySet => ({
      ...l,
      versions: versions.filter((v) => v.setId === l.id),
    })) as unknown as LibrarySet[],
    fits.map((f) => ({ ...f, residuals: f.residuals ?? [], warnings: f.warnings ?? [] })),
    new Map(records.map((r) => [r.id, r.name])),
  );
  // A path may hold up to 1,000,000 increments: the curves are computed in the compute pool,
  // each set with its share of the task's budget; a set over its share is left out of the charts
  // (and said so) rather than stopping the report. A tenth is kept for the standard tension runs.
  const sets = file.parameterSets;
  const perSetBudgetMs = Math.floor((computeBudgetMs() * 0.9) / Math.max(1, sets.length));
  const { charts, statuses, skipped } = await compute<ReportCurves>(
    { kind: "report-curves", sets, legs: file.path.legs, perSetBudgetMs },
    ctx.actor.id,
    "report",
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
    charts,
    statuses,
    skipped,
  };
}
export type CalibrationReport = Awaited<ReturnType<typeof loadCalibrationReport>>;

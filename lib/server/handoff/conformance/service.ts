import "server-only";

/** Conformance checks recorded on a revision: run (scenario:edit), list and download (team:read). */
import type { Executor } from "@/db/client";
import {
  findConformanceCheck,
  insertConformanceCheck,
  listConformanceChecksOfRevision,
} from "@/db/queries/conformance-checks";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { notFound, requireUuid } from "@/lib/server/workspace/errors";
import { parseScenarioFileOrThrow, parseWithPath } from "@/lib/server/workspace/parse";
import { revisionInTeam } from "@/lib/server/access/scope";

import { compute } from "@/lib/server/compute/pool";
import type { Scenario } from "@/lib/scenario/scenario-schema";

import { differencesCsv } from "./differences-csv";
import type { ConformanceReplay } from "./run-check";
import type { ConformanceTolerance } from "./types";
import { conformanceUploadSchema, type HistoryMapping } from "./upload-schema";

/**
 * Reads, replays and compares a history in the compute pool (the CSV reader and the driver never
 * run on the request thread); the download's CSV is written here from what comes back.
 */
async function replayInPool(
  person: string,
  scenario: Scenario,
  setId: string | undefined,
  text: string,
  tolerance: ConformanceTolerance,
  mapping: HistoryMapping | undefined,
) {
  const run = await compute<ConformanceReplay>(
    { kind: "conformance", scenario, setId, text, tolerance, mapping },
    person,
    "conformance check",
  );
  const { history, columns, rowOf } = run.curves;
  return { ...run, differences: () => differencesCsv(run.result, history, columns, rowOf) };
}

interface RevisionRef {
  teamSlug: string;
  scenarioId: unknown;
  number: unknown;
}

export async function createConformanceCheck(
  db: Executor,
  actor: Actor,
  ref: RevisionRef,
  input: unknown,
) {
  const ctx = await authorizeTeam(db, actor, ref.teamSlug, "scenario:edit");
  const { revision } = await revisionInTeam(db, ctx.team.id, ref.scenarioId, ref.number);
  const data = parseWithPath(conformanceUploadSchema, input);
  const scenario = parseScenarioFileOrThrow(revision.file);
  const { result } = await replayInPool(
    ctx.actor.id,
    scenario,
    data.set,
    data.text,
    data.tolerance,
    data.mapping,
  );
  const row = await insertConformanceCheck(db, {
    teamId: ctx.team.id,
    revisionId: revision.id,
    setId: result.setId,
    fileName: data.fileName,
    fileText: data.text,
    passed: result.passed,
    firstFailIncrement: result.firstFailIncrement,
    result: { ...result, mapping: data.mapping },
    createdBy: ctx.actor.id,
  });
  await recordAudit(db, {
    actorId: ctx.actor.id,
    teamId: ctx.team.id,
    action: "conformance.create",
    target: row.id,
    detail: { revision: revision.number, passed: result.passed, fileName: data.fileName },
  });
  return { id: row.id, passed: row.passed, firstFailIncrement: row.firstFailIncrement, result };
}

export async function listConformanceChecks(db: Executor, actor: Actor, ref: RevisionRef) {
  const ctx = await authorizeTeam(db, actor, ref.teamSlug, "team:read");
  const { revision } = await revisionInTeam(db, ctx.team.id, ref.scenarioId, ref.number);
  return { items: await listConformanceChecksOfRevision(db, revision.id) };
}

/** One recorded check as stored (its comparison included), without replaying it. */
export async function findConformanceCheckOfRevision(
  db: Executor,
  actor: Actor,
  ref: RevisionRef,
  checkId: unknown,
) {
  const ctx = await authorizeTeam(db, actor, ref.teamSlug, "team:read");
  const { scenario, revision } = await revisionInTeam(db, ctx.team.id, ref.scenarioId, ref.number);
  const row = await findConformanceCheck(
    db,
    revision.id,
    requireUuid(checkId, "conformance-check"),
  );
  if (!row) throw notFound("conformance-check");
  return { ctx, row, scenario, revision };
}

/** The check replayed again from its stored file: both curves and the per-increment differences. */
export async function loadConformanceCheck(
  db: Executor,
  actor: Actor,
  ref: RevisionRef,
  checkId: unknown,
) {
  const { ctx, row, scenario, revision } = await findConformanceCheckOfRevision(
    db,
    actor,
    ref,
    checkId,
  );
  const file = parseScenarioFileOrThrow(revision.file);
  const again = await replayInPool(
    ctx.actor.id,
    file,
    row.setId,
    row.fileText,
    row.result.tolerance,
    row.result.mapping,
  );
  return { row, scenario, revision, ...again };
}

import type { Db } from "@/db/client";
import {
  deleteScenarioRow,
  findScenarioSummary,
  insertScenario,
  listScenariosForTeam,
  updateScenarioRow,
  type ScenarioSummary,
} from "@/db/queries/scenarios";
import { findRevisionMeta, insertRevision, type RevisionMeta } from "@/db/queries/revisions";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { authorizeTeam } from "@/lib/server/access/team-access";
import {
  createScenarioSchema,
  scenarioListQuerySchema,
  updateScenarioSchema,
} from "@/lib/shared/validations/workspace";

import { notFound } from "./errors";
import { parseScenarioFileOrThrow, parseWithPath } from "./parse";
import { scenarioInTeam } from "../access/scope";

export type ScenarioListResponse = Awaited<ReturnType<typeof listScenarios>>;
export type ScenarioResponse = ScenarioSummary;
export interface CreateScenarioResponse {
  scenario: ScenarioSummary;
  revision: RevisionMeta;
}

/** The team's scenarios, one page at a time, with the total for the pager. */
export async function listScenarios(db: Db, actor: Actor, teamSlug: string, query: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const q = parseWithPath(scenarioListQuerySchema, query);
  return listScenariosForTeam(db, ctx.team.id, q);
}

export async function getScenario(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
): Promise<ScenarioSummary> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const row = await scenarioInTeam(db, ctx.team.id, scenarioId);
  const summary = await findScenarioSummary(db, ctx.team.id, row.id);
  if (!summary) throw notFound("scenario");
  return summary;
}

/** A new scenario always starts with revision 1, so there is never a scenario without a file. */
export async function createScenario(
  db: Db,
  actor: Actor,
  teamSlug: string,
  input: unknown,
): Promise<CreateScenarioResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "scenario:edit");
  const data = parseWithPath(createScenarioSchema, input);
  parseScenarioFileOrThrow(data.file);
  const scenarioId = await db.transaction(async (tx) => {
    const now = new Date();
    const row = await insertScenario(tx, {
      teamId: ctx.team.id,
      name: data.name,
      materialLabel: data.materialLabel,
      tags: data.tags,
      createdBy: ctx.actor.id,
      latestRevision: 1,
      createdAt: now,
      updatedAt: now,
    });
    await insertRevision(tx, {
      scenarioId: row.id,
      number: 1,
      authorId: ctx.actor.id,
      message: data.message,
      // Stored as sent (once valid): top-level editor metadata such as chart setup survives.
      file: data.file as Record<string, unknown>,
      createdAt: now,
    });
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "scenario.create",
      target: row.id,
      detail: { name: data.name },
    });
    return row.id;
  });
  const [scenario, revision] = await Promise.all([
    findScenarioSummary(db, ctx.team.id, scenarioId),
    findRevisionMeta(db, scenarioId, 1),
  ]);
  return { scenario: scenario!, revision: revision! };
}

/** Rename, relabel or retag; revisions stay untouched. */
export async function updateScenario(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  input: unknown,
): Promise<ScenarioSummary> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "scenario:edit");
  const data = parseWithPath(updateScenarioSchema, input);
  const row = await scenarioInTeam(db, ctx.team.id, scenarioId);
  await db.transaction(async (tx) => {
    await updateScenarioRow(tx, row.id, { ...data, updatedAt: new Date() });
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "scenario.update",
      target: row.id,
      detail: {
        from: { name: row.name, materialLabel: row.materialLabel, tags: row.tags },
        to: data,
      },
    });
  });
  return (await findScenarioSummary(db, ctx.team.id, row.id))!;
}

/** Deletes the scenario with its revisions, comments, review history and share links. */
export async function deleteScenario(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
): Promise<{ deleted: string }> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "scenario:edit");
  const row = await scenarioInTeam(db, ctx.team.id, scenarioId);
  await db.transaction(async (tx) => {
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "scenario.delete",
      target: row.id,
      detail: { name: row.name, revisions: row.latestRevision },
    });
    await deleteScenarioRow(tx, row.id);
  });
  return { deleted: row.id };
}

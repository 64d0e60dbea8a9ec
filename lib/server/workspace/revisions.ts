import "server-only";

import type { Db } from "@/db/client";
import {
  findRevisionMeta,
  insertRevision,
  listRevisionsOfScenario,
  type RevisionMeta,
} from "@/db/queries/revisions";
import { setLatestRevision } from "@/db/queries/scenarios";
import type { Actor } from "@/lib/server/accounts/actor";
import { isUniqueViolation } from "@/lib/server/accounts/pg-errors";
import { recordAudit } from "@/lib/server/access/audit";
import { AppError } from "@/lib/shared/errors";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { saveRevisionSchema } from "@/lib/shared/validations/workspace";

import { DetailedAppError, notFound } from "./errors";
import { parseScenarioFileOrThrow, parseWithPath } from "./parse";
import { revisionInTeam, scenarioInTeam } from "../access/scope";

export type RevisionListResponse = { items: RevisionMeta[] };
export type RevisionResponse = RevisionMeta & { file: Record<string, unknown> };
export type SaveRevisionResponse = RevisionMeta;

export async function listRevisions(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
): Promise<RevisionListResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const scenario = await scenarioInTeam(db, ctx.team.id, scenarioId);
  return { items: await listRevisionsOfScenario(db, scenario.id) };
}

export async function getRevision(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  number: unknown,
): Promise<RevisionResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const { scenario, revision } = await revisionInTeam(db, ctx.team.id, scenarioId, number);
  const meta = await findRevisionMeta(db, scenario.id, revision.number);
  if (!meta) throw notFound("revision");
  return { ...meta, file: revision.file };
}

/** The newest revision, for the 409 answer: who saved it and when. */
async function conflictWith(db: Db, scenarioId: string, latestNumber: number, base: number) {
  const latest = await findRevisionMeta(db, scenarioId, latestNumber);
  const who = latest?.author?.name ?? "someone";
  return new DetailedAppError(
    "conflict:revision",
    `You started from revision ${base}, but ${who} saved revision ${latestNumber} since. ` +
      "Nothing was overwritten: look at their revision, then save yours as a new revision.",
    {
      latest: {
        number: latestNumber,
        author: latest?.author ?? null,
        at: latest?.createdAt ?? null,
      },
    },
  );
}

/**
 * Saves a new revision on top of `baseRevision`. The scenario row is locked for the
 * transaction, so of two saves from the same base exactly one wins; the other gets 409 and
 * keeps its content on the client. The unique (scenario, number) pair is the second line.
 */
export async function saveRevision(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  input: unknown,
): Promise<SaveRevisionResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "scenario:edit");
  const data = parseWithPath(saveRevisionSchema, input);
  parseScenarioFileOrThrow(data.file);
  const { id } = await scenarioInTeam(db, ctx.team.id, scenarioId);
  let outcome: { number: number } | { conflict: number };
  try {
    outcome = await db.transaction(async (tx) => {
      const row = await scenarioInTeam(tx, ctx.team.id, id, true);
      if (data.baseRevision > row.latestRevision) {
        throw new AppError(
          "invalid:baseRevision",
          `This scenario has no revision ${data.baseRevision} (the newest is ${row.latestRevision}).`,
          "baseRevision",
        );
      }
      if (data.baseRevision !== row.latestRevision) return { conflict: row.latestRevision };
      const number = row.latestRevision + 1;
      const now = new Date();
      await insertRevision(tx, {
        scenarioId: row.id,
        number,
        authorId: ctx.actor.id,
        message: data.message,
        file: data.file as Record<string, unknown>,
        createdAt: now,
      });
      await setLatestRevision(tx, row.id, number, now);
      await recordAudit(tx, {
        actorId: ctx.actor.id,
        teamId: ctx.team.id,
        action: "revision.save",
        target: row.id,
        detail: { number, base: data.baseRevision },
      });
      return { number };
    });
  } catch (error) {
    if (!isUniqueViolation(error)) throw error;
    const row = await scenarioInTeam(db, ctx.team.id, id);
    outcome = { conflict: row.latestRevision };
  }
  if ("conflict" in outcome) throw await conflictWith(db, id, outcome.conflict, data.baseRevision);
  return (await findRevisionMeta(db, id, outcome.number))!;
}

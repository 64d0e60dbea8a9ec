import "server-only";

import type { Db } from "@/db/client";
import {
  findRevisionMeta,
  listRevisionsOfScenario,
  newRevisionMeta,
  type RevisionMeta,
} from "@/db/queries/revisions";
import { insertRevisionOnTop } from "@/db/queries/save-revision";
import type { Actor } from "@/lib/server/accounts/actor";
import { isUniqueViolation } from "@/lib/server/accounts/pg-errors";
import { AppError } from "@/lib/shared/errors";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { saveRevisionSchema } from "@/lib/shared/validations/workspace";

import { DetailedAppError, notFound, requireUuid } from "./errors";
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
 * Saves a new revision on top of `baseRevision`: one statement moves the scenario's newest
 * revision on, inserts the revision and its audit event (db/queries/save-revision.ts), so of two
 * saves from the same base exactly one wins; the other gets 409 and keeps its content on the
 * client. The unique (scenario, number) pair is the second line. The answer is built from what
 * was written (the author is the signed-in actor), not read back.
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
  const id = requireUuid(scenarioId, "scenario");
  const now = new Date();
  let saved: { id: string; number: number } | null;
  try {
    saved = await insertRevisionOnTop(db, {
      scenarioId: id,
      teamId: ctx.team.id,
      base: data.baseRevision,
      authorId: ctx.actor.id,
      message: data.message,
      // Stored as sent (once valid): top-level editor metadata such as chart setup survives.
      file: data.file as Record<string, unknown>,
      at: now,
    });
  } catch (error) {
    if (!isUniqueViolation(error)) throw error;
    saved = null;
  }
  if (saved) return newRevisionMeta(saved, ctx.actor, data.message, now);
  // Nothing written: another team's or an unknown scenario (404), a base from the future, or
  // someone saved since the base (409).
  const row = await scenarioInTeam(db, ctx.team.id, id);
  if (data.baseRevision > row.latestRevision) {
    throw new AppError(
      "invalid:baseRevision",
      `This scenario has no revision ${data.baseRevision} (the newest is ${row.latestRevision}).`,
      "baseRevision",
    );
  }
  throw await conflictWith(db, id, row.latestRevision, data.baseRevision);
}

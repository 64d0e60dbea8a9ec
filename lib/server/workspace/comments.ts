import "server-only";

import type { Db } from "@/db/client";
import {
  findCommentRow,
  insertComment,
  listCommentsOfRevision,
  setCommentBody,
} from "@/db/queries/comments";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { AppError } from "@/lib/shared/errors";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { commentSchema, editCommentSchema } from "@/lib/shared/validations/workspace";

import { type CommentNode, toThreads } from "./comment-thread";
import { notFound, requireUuid } from "./errors";
import { parseWithPath } from "./parse";
import { revisionInTeam } from "../access/scope";

export type CommentListResponse = { items: CommentNode[] };
export type { CommentNode };

async function commentsOf(db: Db, revisionId: string): Promise<CommentListResponse> {
  return { items: toThreads(await listCommentsOfRevision(db, revisionId)) };
}

export async function listComments(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  number: unknown,
): Promise<CommentListResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const { revision } = await revisionInTeam(db, ctx.team.id, scenarioId, number);
  return commentsOf(db, revision.id);
}

/** The number of increments of a stored file: a pin must point inside the path. */
function incrementCount(file: unknown): number {
  const parsed = parseScenarioFile(file);
  return parsed.ok ? parsed.scenario.path.legs.reduce((n, leg) => n + leg.increments, 0) : 0;
}

/** A comment or a reply (parentId on the same revision), optionally pinned to an increment. */
export async function addComment(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  number: unknown,
  input: unknown,
): Promise<CommentListResponse & { id: string }> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "comment:write");
  const { revision } = await revisionInTeam(db, ctx.team.id, scenarioId, number);
  const data = parseWithPath(commentSchema, input);
  if (data.parentId && !(await findCommentRow(db, revision.id, data.parentId))) {
    throw new AppError(
      "not-found:comment",
      "The comment you reply to is not on this revision.",
      "parentId",
    );
  }
  if (data.increment !== undefined && data.increment > incrementCount(revision.file)) {
    throw new AppError(
      "invalid:increment",
      `This revision's path has ${incrementCount(revision.file)} increments; pin to one of them.`,
      "increment",
    );
  }
  const id = await db.transaction(async (tx) => {
    const row = await insertComment(tx, {
      revisionId: revision.id,
      parentId: data.parentId ?? null,
      authorId: ctx.actor.id,
      body: data.body,
      increment: data.increment ?? null,
    });
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "comment.create",
      target: row.id,
      detail: {
        scenarioId: revision.scenarioId,
        revision: revision.number,
        reply: !!data.parentId,
      },
    });
    return row.id;
  });
  return { id, ...(await commentsOf(db, revision.id)) };
}

/** Authors may correct their own words; the trail keeps what it said before. */
export async function editComment(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  number: unknown,
  commentId: unknown,
  input: unknown,
): Promise<CommentListResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "comment:write");
  const { revision } = await revisionInTeam(db, ctx.team.id, scenarioId, number);
  const comment = await findCommentRow(db, revision.id, requireUuid(commentId, "comment"));
  if (!comment) throw notFound("comment");
  if (comment.authorId !== ctx.actor.id) {
    throw new AppError("forbidden:comment", "Only the author may edit a comment.");
  }
  const data = parseWithPath(editCommentSchema, input);
  await db.transaction(async (tx) => {
    await setCommentBody(tx, comment.id, data.body, new Date());
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "comment.edit",
      target: comment.id,
      detail: { before: comment.body },
    });
  });
  return commentsOf(db, revision.id);
}

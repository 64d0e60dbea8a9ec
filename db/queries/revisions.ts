import { and, desc, eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";

import type { Executor } from "@/db/client";
import { reviewEvents, scenarioRevisions } from "@/db/schema/scenarios";
import { users } from "@/db/schema/users";

import { personRef, type PersonRef } from "./users-view";

// Revisions of one scenario. The caller has found the scenario in the actor's team.

const author = alias(users, "author");
const reviewer = alias(users, "reviewer");

const metaColumns = {
  id: scenarioRevisions.id,
  number: scenarioRevisions.number,
  author: personRef(author.id, author.name),
  message: scenarioRevisions.message,
  createdAt: scenarioRevisions.createdAt,
  reviewState: scenarioRevisions.reviewState,
  reviewBy: personRef(reviewer.id, reviewer.name),
  reviewAt: scenarioRevisions.reviewAt,
  importedReviewBy: scenarioRevisions.importedReviewBy,
};

function metaQuery(db: Executor) {
  return db
    .select(metaColumns)
    .from(scenarioRevisions)
    .leftJoin(author, eq(author.id, scenarioRevisions.authorId))
    .leftJoin(reviewer, eq(reviewer.id, scenarioRevisions.reviewBy));
}

type MetaRow = Awaited<ReturnType<ReturnType<typeof metaQuery>["execute"]>>[number];

function toRevisionMeta(row: MetaRow) {
  return {
    id: row.id,
    number: row.number,
    author: row.author,
    message: row.message,
    createdAt: row.createdAt.toISOString(),
    review: {
      state: row.reviewState,
      by: row.reviewBy,
      at: row.reviewAt?.toISOString() ?? null,
      /** Name from a team import, as text: who the file said gave this verdict. */
      importedBy: row.importedReviewBy,
    },
  };
}
export type RevisionMeta = ReturnType<typeof toRevisionMeta>;

/** The meta of a revision just saved, from what was written: a new revision is a draft. */
export function newRevisionMeta(
  saved: { id: string; number: number },
  author: PersonRef,
  message: string,
  at: Date,
): RevisionMeta {
  return toRevisionMeta({
    id: saved.id,
    number: saved.number,
    author: { id: author.id, name: author.name },
    message,
    createdAt: at,
    reviewState: "draft",
    reviewBy: null,
    reviewAt: null,
    importedReviewBy: null,
  });
}

export async function listRevisionsOfScenario(db: Executor, scenarioId: string) {
  const rows = await metaQuery(db)
    .where(eq(scenarioRevisions.scenarioId, scenarioId))
    .orderBy(desc(scenarioRevisions.number));
  return rows.map(toRevisionMeta);
}

export async function findRevisionMeta(db: Executor, scenarioId: string, number: number) {
  const [row] = await metaQuery(db).where(
    and(eq(scenarioRevisions.scenarioId, scenarioId), eq(scenarioRevisions.number, number)),
  );
  return row ? toRevisionMeta(row) : null;
}

export type NewRevision = typeof scenarioRevisions.$inferInsert;

export async function insertRevision(db: Executor, values: NewRevision) {
  await db.insert(scenarioRevisions).values(values);
}

/** The stored row, file included. */
export async function findRevisionRow(db: Executor, scenarioId: string, number: number) {
  const [row] = await db
    .select()
    .from(scenarioRevisions)
    .where(and(eq(scenarioRevisions.scenarioId, scenarioId), eq(scenarioRevisions.number, number)));
  return row ?? null;
}

const actor = alias(users, "actor");

// Whom a request was asked of, as people (accounts since deleted drop out), by name.
const askedOf = sql<PersonRef[]>`coalesce((
  select json_agg(json_build_object('id', asked.id, 'name', asked.name) order by asked.name, asked.id)
  from ${users} as asked where asked.id = any(${reviewEvents.chosenReviewers})
), '[]'::json)`;

export async function listReviewEvents(db: Executor, revisionId: string) {
  const rows = await db
    .select({
      id: reviewEvents.id,
      from: reviewEvents.fromState,
      to: reviewEvents.toState,
      actor: personRef(actor.id, actor.name),
      note: reviewEvents.note,
      at: reviewEvents.at,
      importedActor: reviewEvents.importedActor,
      askedOf,
    })
    .from(reviewEvents)
    .leftJoin(actor, eq(actor.id, reviewEvents.actorId))
    .where(eq(reviewEvents.revisionId, revisionId))
    .orderBy(reviewEvents.at, reviewEvents.id);
  return rows.map((r) => ({ ...r, at: r.at.toISOString() }));
}
export type ReviewEventView = Awaited<ReturnType<typeof listReviewEvents>>[number];

import { and, desc, eq } from "drizzle-orm";

import type { Executor } from "@/db/client";
import {
  reviewEvents,
  scenarioRevisions,
  scenarios,
  type ReviewState,
} from "@/db/schema/scenarios";

// Writes of a revision's review. The caller has found the revision in the actor's team.

/**
 * Compare-and-set: moves the review only while it is still in `from`; the rows it changed
 * (none when someone else moved it first). A verdict given here replaces an imported one.
 */
export async function moveReviewState(
  db: Executor,
  revisionId: string,
  from: ReviewState,
  move: { to: ReviewState; by: string; at: Date },
) {
  return db
    .update(scenarioRevisions)
    .set({ reviewState: move.to, reviewBy: move.by, reviewAt: move.at, importedReviewBy: null })
    .where(and(eq(scenarioRevisions.id, revisionId), eq(scenarioRevisions.reviewState, from)))
    .returning({ id: scenarioRevisions.id });
}

/** Copies the state to the scenario row only while `number` is still its latest revision. */
export async function setLatestReviewStateIfLatest(
  db: Executor,
  scenarioId: string,
  number: number,
  state: ReviewState,
) {
  await db
    .update(scenarios)
    .set({ latestReviewState: state })
    .where(and(eq(scenarios.id, scenarioId), eq(scenarios.latestRevision, number)));
}

/** Who last sent the revision for review (the newest move to in_review), if anyone. */
export async function findLastReviewRequester(db: Executor, revisionId: string) {
  const [lastRequest] = await db
    .select({ actorId: reviewEvents.actorId })
    .from(reviewEvents)
    .where(and(eq(reviewEvents.revisionId, revisionId), eq(reviewEvents.toState, "in_review")))
    .orderBy(desc(reviewEvents.at))
    .limit(1);
  return lastRequest;
}

export type NewReviewEvent = typeof reviewEvents.$inferInsert;

export async function insertReviewEvent(db: Executor, values: NewReviewEvent) {
  await db.insert(reviewEvents).values(values);
}

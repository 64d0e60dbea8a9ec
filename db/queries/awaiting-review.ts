import { and, desc, eq, inArray, isNull, ne, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";

import type { Executor } from "@/db/client";
import { reviewEvents, scenarioRevisions, scenarios } from "@/db/schema/scenarios";
import { memberships } from "@/db/schema/teams";
import { users } from "@/db/schema/users";

import { personRef } from "./users-view";

const requester = alias(users, "requester");

// The reviewers the revision's current request was asked of: the newest move to in_review.
const chosenNow = sql`(
  select ${reviewEvents.chosenReviewers} from ${reviewEvents}
  where ${reviewEvents.revisionId} = ${scenarioRevisions.id} and ${reviewEvents.toState} = 'in_review'
  order by ${reviewEvents.at} desc, ${reviewEvents.id} desc limit 1
)`;

/** The user is among the chosen; a request with no choice (imported, or older) awaits all. */
function askedOf(userId: string) {
  return sql`(coalesce(cardinality(${chosenNow}), 0) = 0 or ${chosenNow} @> array[${userId}::uuid])`;
}

/**
 * Revisions of this team now in review on which the user may give a verdict (they are a
 * reviewer or owner here), which the request was asked of them (every reviewer and owner when
 * the request chose nobody: imported history, requests made before reviewers were chosen),
 * and which they did not send for review themselves. While a
 * revision is in review, its review_by/review_at columns hold the request (who and when).
 * The membership join keeps the list empty for anyone without the verdict role, so the
 * query alone never shows another team's work or work the user may not judge.
 */
export async function listAwaitingReview(
  db: Executor,
  opts: { teamId: string; userId: string; limit?: number },
) {
  const rows = await db
    .select({
      scenarioId: scenarios.id,
      scenarioName: scenarios.name,
      number: scenarioRevisions.number,
      requestedBy: personRef(requester.id, requester.name),
      requestedAt: scenarioRevisions.reviewAt,
      // An imported revision still in review names its requester as text from the file.
      importedRequester: scenarioRevisions.importedReviewBy,
    })
    .from(scenarioRevisions)
    .innerJoin(scenarios, eq(scenarios.id, scenarioRevisions.scenarioId))
    .innerJoin(
      memberships,
      and(
        eq(memberships.teamId, scenarios.teamId),
        eq(memberships.userId, opts.userId),
        inArray(memberships.role, ["owner", "reviewer"]),
      ),
    )
    .leftJoin(requester, eq(requester.id, scenarioRevisions.reviewBy))
    .where(
      and(
        eq(scenarios.teamId, opts.teamId),
        eq(scenarioRevisions.reviewState, "in_review"),
        or(isNull(scenarioRevisions.reviewBy), ne(scenarioRevisions.reviewBy, opts.userId)),
        askedOf(opts.userId),
      ),
    )
    .orderBy(desc(scenarioRevisions.reviewAt), scenarios.name, desc(scenarioRevisions.number))
    .limit(opts.limit ?? 50);
  return rows.map((r) => ({ ...r, requestedAt: r.requestedAt?.toISOString() ?? null }));
}
export type AwaitingReview = Awaited<ReturnType<typeof listAwaitingReview>>[number];

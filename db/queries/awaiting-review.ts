import { and, desc, eq, inArray, isNull, ne, or } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";

import type { Executor } from "@/db/client";
import { scenarioRevisions, scenarios } from "@/db/schema/scenarios";
import { memberships } from "@/db/schema/teams";
import { users } from "@/db/schema/users";

import { personRef } from "./users-view";

const requester = alias(users, "requester");

/**
 * Revisions of this team now in review on which the user may give a verdict (they are a
 * reviewer or owner here) and which they did not send for review themselves. While a
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
      ),
    )
    .orderBy(desc(scenarioRevisions.reviewAt), scenarios.name, desc(scenarioRevisions.number))
    .limit(opts.limit ?? 50);
  return rows.map((r) => ({ ...r, requestedAt: r.requestedAt?.toISOString() ?? null }));
}
export type AwaitingReview = Awaited<ReturnType<typeof listAwaitingReview>>[number];

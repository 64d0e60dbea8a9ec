import { and, asc, eq, inArray, ne } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { memberships, type TeamRole } from "@/db/schema/teams";
import { users } from "@/db/schema/users";

/** The roles that give verdicts: a review request may only be asked of these members. */
export const VERDICT_ROLES = ["owner", "reviewer"] as const satisfies readonly TeamRole[];

/** The team's reviewers and owners a review may be asked of, the requester left out. */
export async function listReviewerChoices(db: Executor, teamId: string, requesterId: string) {
  return db
    .select({ id: users.id, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(
      and(
        eq(memberships.teamId, teamId),
        inArray(memberships.role, [...VERDICT_ROLES]),
        ne(memberships.userId, requesterId),
      ),
    )
    .orderBy(asc(users.name), asc(users.id));
}
export type ReviewerChoice = Awaited<ReturnType<typeof listReviewerChoices>>[number];

/** Of the given user ids, the current members of the team with their name and role. */
export async function findTeamMembersAmong(db: Executor, teamId: string, userIds: string[]) {
  if (userIds.length === 0) return [];
  return db
    .select({ id: users.id, name: users.name, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.teamId, teamId), inArray(memberships.userId, userIds)));
}

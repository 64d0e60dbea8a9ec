import { and, asc, eq, gt, isNull } from "drizzle-orm";

import type { Db } from "@/db/client";
import { invitations } from "@/db/schema/invitations";
import { memberships, teams } from "@/db/schema/teams";
import { users } from "@/db/schema/users";

// Read-side queries for pages (teams of a user, members, open invitations). They trust the
// caller to have authorized the team already.

export async function listTeamsForUser(db: Db, userId: string) {
  return db
    .select({
      slug: teams.slug,
      name: teams.name,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(teams, eq(teams.id, memberships.teamId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(teams.name));
}
export type TeamListItem = Awaited<ReturnType<typeof listTeamsForUser>>[number];

export async function listMembers(db: Db, teamId: string) {
  return db
    .select({
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.teamId, teamId))
    .orderBy(asc(users.name));
}
export type MemberListItem = Awaited<ReturnType<typeof listMembers>>[number];

export async function listOpenInvitations(db: Db, teamId: string, now = new Date()) {
  return db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
    })
    .from(invitations)
    .where(
      and(
        eq(invitations.teamId, teamId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        gt(invitations.expiresAt, now),
      ),
    )
    .orderBy(asc(invitations.email));
}
export type OpenInvitation = Awaited<ReturnType<typeof listOpenInvitations>>[number];

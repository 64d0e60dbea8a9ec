import { and, asc, eq, gt, isNull } from "drizzle-orm";

import type { Db, Executor } from "@/db/client";
import { invitations } from "@/db/schema/invitations";
import { memberships, teams, type Team } from "@/db/schema/teams";
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

// Writes on the team row itself; the services authorize and audit around them.

/** Inserts a team; a taken slug fails on the unique index (the caller retries with another). */
export async function insertTeam(
  db: Executor,
  values: { slug: string; name: string },
): Promise<Team> {
  const [team] = await db.insert(teams).values(values).returning();
  return team;
}

export async function renameTeamRow(db: Executor, teamId: string, name: string): Promise<Team> {
  const [team] = await db.update(teams).set({ name }).where(eq(teams.id, teamId)).returning();
  return team;
}

/** Deletes the team; memberships and invitations go by cascade. */
export async function deleteTeamRow(db: Executor, teamId: string): Promise<void> {
  await db.delete(teams).where(eq(teams.id, teamId));
}

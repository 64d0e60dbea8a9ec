import { and, count, eq } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { memberships, teams, type TeamRole } from "@/db/schema/teams";
import { users } from "@/db/schema/users";

// Membership rows: who belongs to a team with which role. The services hold the rules (who may
// change whom, the last owner); these only read and write.

/** The team under a slug with the user's role in it; none when the user is not a member. */
export async function findTeamWithRoleOfUser(db: Executor, teamSlug: string, userId: string) {
  const [row] = await db
    .select({ team: teams, role: memberships.role })
    .from(teams)
    .innerJoin(memberships, and(eq(memberships.teamId, teams.id), eq(memberships.userId, userId)))
    .where(eq(teams.slug, teamSlug));
  return row;
}

/** Locks the team row (select … for update) until the transaction ends. */
export async function lockTeamRow(tx: Executor, teamId: string): Promise<void> {
  await tx.select({ id: teams.id }).from(teams).where(eq(teams.id, teamId)).for("update");
}

export async function countOwners(tx: Executor, teamId: string): Promise<number> {
  const [row] = await tx
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.role, "owner")));
  return row.n;
}

export async function findMembership(db: Executor, teamId: string, userId: string) {
  const [row] = await db
    .select()
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
  return row;
}

/** The membership of whoever holds this e-mail address in the team, if any. */
export async function findMemberByEmail(db: Executor, teamId: string, email: string) {
  const [row] = await db
    .select({ userId: memberships.userId })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.teamId, teamId), eq(users.email, email)));
  return row;
}

export async function insertMembership(
  db: Executor,
  values: { teamId: string; userId: string; role: TeamRole },
): Promise<void> {
  await db.insert(memberships).values(values);
}

/** Inserts unless the user is a member already; false in that case. */
export async function insertMembershipIfAbsent(
  db: Executor,
  values: { teamId: string; userId: string; role: TeamRole },
): Promise<boolean> {
  const inserted = await db
    .insert(memberships)
    .values(values)
    .onConflictDoNothing()
    .returning({ userId: memberships.userId });
  return inserted.length > 0;
}

export async function setMemberRole(
  db: Executor,
  teamId: string,
  userId: string,
  role: TeamRole,
): Promise<void> {
  await db
    .update(memberships)
    .set({ role })
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
}

export async function deleteMembership(db: Executor, teamId: string, userId: string) {
  await db
    .delete(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
}

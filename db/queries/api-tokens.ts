import { and, desc, eq, isNull } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { apiTokens, type ApiTokenRow } from "@/db/schema/api-tokens";
import { memberships, teams, type TeamRole } from "@/db/schema/teams";
import { users } from "@/db/schema/users";

export async function insertApiToken(
  db: Executor,
  values: typeof apiTokens.$inferInsert,
): Promise<ApiTokenRow> {
  const [row] = await db.insert(apiTokens).values(values).returning();
  return row;
}

export async function listApiTokensOfUser(db: Executor, userId: string) {
  return db
    .select({
      id: apiTokens.id,
      name: apiTokens.name,
      role: apiTokens.role,
      prefix: apiTokens.prefix,
      createdAt: apiTokens.createdAt,
      lastUsedAt: apiTokens.lastUsedAt,
      revokedAt: apiTokens.revokedAt,
      teamSlug: teams.slug,
      teamName: teams.name,
    })
    .from(apiTokens)
    .innerJoin(teams, eq(teams.id, apiTokens.teamId))
    .where(eq(apiTokens.userId, userId))
    .orderBy(desc(apiTokens.createdAt));
}

/** Revokes one of the user's own tokens; false when there is no such live token. */
export async function revokeApiTokenOfUser(
  db: Executor,
  userId: string,
  tokenId: string,
): Promise<boolean> {
  const rows = await db
    .update(apiTokens)
    .set({ revokedAt: new Date() })
    .where(
      and(eq(apiTokens.id, tokenId), eq(apiTokens.userId, userId), isNull(apiTokens.revokedAt)),
    )
    .returning({ id: apiTokens.id });
  return rows.length > 0;
}

export interface TokenLookup {
  token: ApiTokenRow;
  teamSlug: string;
  /** The owner's current role in the token's team; null once they left it. */
  memberRole: TeamRole | null;
  user: { id: string; email: string; name: string; verified: boolean };
}

export async function findApiTokenByHash(db: Executor, hash: string): Promise<TokenLookup | null> {
  const [row] = await db
    .select({
      token: apiTokens,
      teamSlug: teams.slug,
      memberRole: memberships.role,
      userId: users.id,
      email: users.email,
      name: users.name,
      verifiedAt: users.verifiedAt,
    })
    .from(apiTokens)
    .innerJoin(teams, eq(teams.id, apiTokens.teamId))
    .innerJoin(users, eq(users.id, apiTokens.userId))
    .leftJoin(
      memberships,
      and(eq(memberships.teamId, apiTokens.teamId), eq(memberships.userId, apiTokens.userId)),
    )
    .where(eq(apiTokens.tokenHash, hash));
  if (!row) return null;
  return {
    token: row.token,
    teamSlug: row.teamSlug,
    memberRole: row.memberRole,
    user: { id: row.userId, email: row.email, name: row.name, verified: row.verifiedAt !== null },
  };
}

export async function touchApiToken(db: Executor, tokenId: string, at: Date): Promise<void> {
  await db.update(apiTokens).set({ lastUsedAt: at }).where(eq(apiTokens.id, tokenId));
}

/**
 * Revokes every live token of a user, or only those bound to one team. A token is a credential
 * with a reason: a password reset (the account may have been taken over) or leaving a team ends
 * it, so a later invitation back does not bring old tokens to life.
 */
export async function revokeApiTokensOfUser(
  db: Executor,
  userId: string,
  at: Date,
  teamId?: string,
): Promise<void> {
  const live = and(eq(apiTokens.userId, userId), isNull(apiTokens.revokedAt));
  await db
    .update(apiTokens)
    .set({ revokedAt: at })
    .where(teamId ? and(live, eq(apiTokens.teamId, teamId)) : live);
}

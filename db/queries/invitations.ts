import { and, eq, gt, isNull } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { invitations, type Invitation } from "@/db/schema/invitations";
import { teams } from "@/db/schema/teams";
import { users } from "@/db/schema/users";

// Invitation rows. Open means neither accepted nor revoked; the services decide what a state
// means for the person holding the link.

/** The invitation under a token hash with its team and the inviter's name (null once gone). */
export async function findInvitationByTokenHash(db: Executor, tokenHash: string) {
  const [row] = await db
    .select({ invitation: invitations, team: teams, inviterName: users.name })
    .from(invitations)
    .innerJoin(teams, eq(teams.id, invitations.teamId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, tokenHash));
  return row;
}

/** Marks an open invitation accepted; false when it was accepted or revoked meanwhile. */
export async function consumeInvitation(
  db: Executor,
  invitationId: string,
  acceptedBy: string,
  at: Date,
): Promise<boolean> {
  const consumed = await db
    .update(invitations)
    .set({ acceptedAt: at, acceptedBy })
    .where(
      and(
        eq(invitations.id, invitationId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    )
    .returning({ id: invitations.id });
  return consumed.length > 0;
}

/** Revokes the open, unexpired invitations of the team to this address. */
export async function revokeOpenInvitationsTo(
  db: Executor,
  teamId: string,
  email: string,
  at: Date,
): Promise<void> {
  await db
    .update(invitations)
    .set({ revokedAt: at })
    .where(
      and(
        eq(invitations.teamId, teamId),
        eq(invitations.email, email),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        gt(invitations.expiresAt, at),
      ),
    );
}

export async function insertInvitation(
  db: Executor,
  values: typeof invitations.$inferInsert,
): Promise<Invitation> {
  const [row] = await db.insert(invitations).values(values).returning();
  return row;
}

/**
 * Revokes one open invitation of the team; its address, or null when it was not open.
 * The team id in the condition keeps an invitation id from another team out of reach.
 */
export async function revokeOpenInvitation(
  db: Executor,
  teamId: string,
  invitationId: string,
  at: Date,
): Promise<string | null> {
  const rows = await db
    .update(invitations)
    .set({ revokedAt: at })
    .where(
      and(
        eq(invitations.id, invitationId),
        eq(invitations.teamId, teamId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    )
    .returning({ email: invitations.email });
  return rows[0]?.email ?? null;
}

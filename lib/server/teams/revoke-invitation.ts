import "server-only";

import { and, eq, isNull } from "drizzle-orm";

import type { Db } from "@/db/client";
import { invitations } from "@/db/schema/invitations";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { AppError } from "@/lib/shared/errors";
import { revokeInvitationSchema } from "@/lib/shared/validations/teams";
import { parseInput } from "@/lib/shared/validations/parse";

import { authorizeTeam } from "../access/team-access";

/** Withdraws an open invitation; whoever may invite may also take an invitation back. */
export async function revokeInvitation(
  db: Db,
  actor: Actor,
  input: unknown,
  now = new Date(),
): Promise<void> {
  const data = parseInput(revokeInvitationSchema, input);
  const ctx = await authorizeTeam(db, actor, data.teamSlug, "member:invite");
  await db.transaction(async (tx) => {
    // The team id in the condition keeps an invitation id from another team out of reach.
    const rows = await tx
      .update(invitations)
      .set({ revokedAt: now })
      .where(
        and(
          eq(invitations.id, data.invitationId),
          eq(invitations.teamId, ctx.team.id),
          isNull(invitations.acceptedAt),
          isNull(invitations.revokedAt),
        ),
      )
      .returning({ email: invitations.email });
    if (rows.length === 0)
      throw new AppError("not-found:invitation", "That invitation is not open any more.");
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "invitation.revoke",
      target: rows[0].email,
    });
  });
}

import "server-only";

import type { Db } from "@/db/client";
import { revokeOpenInvitation } from "@/db/queries/invitations";
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
    // Scoped to this team, so an invitation id from another team stays out of reach.
    const email = await revokeOpenInvitation(tx, ctx.team.id, data.invitationId, now);
    if (email === null)
      throw new AppError("not-found:invitation", "That invitation is not open any more.");
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "invitation.revoke",
      target: email,
    });
  });
}

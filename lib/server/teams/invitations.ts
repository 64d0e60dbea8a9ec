import "server-only";

import type { Db } from "@/db/client";
import { insertInvitation, revokeOpenInvitationsTo } from "@/db/queries/invitations";
import { findMemberByEmail } from "@/db/queries/memberships";
import type { Invitation } from "@/db/schema/invitations";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { canGrant, ROLE_LABELS } from "@/lib/shared/permissions";
import { newToken } from "@/lib/server/accounts/auth/tokens";
import { invitationMessage } from "@/lib/server/email/templates/invitation";
import { linkTo, type MailDeps } from "@/lib/shared/mail-types";
import { AppError } from "@/lib/shared/errors";
import { inviteSchema } from "@/lib/shared/validations/teams";
import { parseInput } from "@/lib/shared/validations/parse";

import { enforceRateLimits, RATE_LIMITS } from "../access/rate-limit";
import { authorizeTeam } from "../access/team-access";

/** Invites an address with a role; a new invitation to the same address replaces the open one. */
export async function inviteMember(
  db: Db,
  actor: Actor,
  input: unknown,
  deps: MailDeps,
  now: Date = new Date(),
): Promise<Invitation & { mailQueued: boolean }> {
  const data = parseInput(inviteSchema, input);
  const ctx = await authorizeTeam(db, actor, data.teamSlug, "member:invite");
  if (!canGrant(ctx.role, data.role)) {
    throw new AppError(
      "forbidden:role",
      `As ${ROLE_LABELS[ctx.role].toLowerCase()} you may not invite someone as ${ROLE_LABELS[data.role].toLowerCase()}.`,
      "role",
    );
  }
  const already = await findMemberByEmail(db, ctx.team.id, data.email);
  if (already) throw new AppError("conflict:member", "This person is a member already.", "email");
  // Each invitation mails an address someone typed: cap it per inviter and per address.
  await enforceRateLimits(
    db,
    "invitation",
    [
      { key: `invitation:actor:${ctx.actor.id}`, rule: RATE_LIMITS.invitationActor },
      { key: `invitation:email:${data.email}`, rule: RATE_LIMITS.invitationEmail },
    ],
    now,
  );

  const token = newToken("invitation", now);
  const invitation = await db.transaction(async (tx) => {
    await revokeOpenInvitationsTo(tx, ctx.team.id, data.email, now);
    const row = await insertInvitation(tx, {
      teamId: ctx.team.id,
      email: data.email,
      role: data.role,
      tokenHash: token.hash,
      invitedBy: ctx.actor.id,
      expiresAt: token.expiresAt,
    });
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "invitation.create",
      target: data.email,
      detail: { role: data.role },
    });
    return row;
  });
  const sent = await deps.mailer.send(
    invitationMessage({
      to: data.email,
      inviterName: ctx.actor.name,
      teamName: ctx.team.name,
      roleLabel: ROLE_LABELS[data.role],
      url: linkTo(deps.appUrl, `/invite/${token.token}`),
    }),
  );
  // The invitation stands either way; a queued mail goes out when the mail server is back.
  return { ...invitation, mailQueued: sent?.queued === true };
}

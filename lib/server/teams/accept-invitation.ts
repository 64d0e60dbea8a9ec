import "server-only";

import type { Db } from "@/db/client";
import { consumeInvitation, findInvitationByTokenHash } from "@/db/queries/invitations";
import { insertMembershipIfAbsent } from "@/db/queries/memberships";
import type { Team } from "@/db/schema/teams";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import type { Role } from "@/lib/shared/permissions";
import { hashToken, looksLikeToken, tokenState } from "@/lib/server/accounts/auth/tokens";
import { AppError } from "@/lib/shared/errors";

import { requireVerified } from "../access/team-access";

export interface InvitationView {
  id: string;
  email: string;
  role: Role;
  team: Team;
  inviterName: string | null;
  state: "valid" | "expired" | "used" | "revoked";
}

const UNKNOWN = "This invitation link is not valid. Ask the team's owner for a new one.";

/** What the invitation page shows; the token itself is the permission to see it. */
export async function findInvitation(
  db: Db,
  token: unknown,
  now = new Date(),
): Promise<InvitationView> {
  if (!looksLikeToken(token)) throw new AppError("not-found:invitation", UNKNOWN);
  const row = await findInvitationByTokenHash(db, hashToken(token));
  if (!row) throw new AppError("not-found:invitation", UNKNOWN);
  const { invitation } = row;
  const state = invitation.revokedAt
    ? "revoked"
    : tokenState({ expiresAt: invitation.expiresAt, usedAt: invitation.acceptedAt }, now);
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    team: row.team,
    inviterName: row.inviterName,
    state: state === "unknown" ? "revoked" : state,
  };
}

/** Joins the team with the invited role; only the invited (and confirmed) address may. */
export async function acceptInvitation(
  db: Db,
  actor: Actor,
  token: unknown,
  now = new Date(),
): Promise<Team> {
  const view = await findInvitation(db, token, now);
  if (view.state === "used")
    throw new AppError("used:invitation", "This invitation was accepted already.");
  if (view.state === "revoked") {
    throw new AppError(
      "used:invitation",
      "This invitation was withdrawn or replaced by a newer one.",
    );
  }
  if (view.state === "expired") {
    throw new AppError(
      "expired:invitation",
      "This invitation has expired. Ask the team's owner for a new one.",
    );
  }
  const user = requireVerified(actor);
  if (user.email !== view.email) {
    throw new AppError(
      "forbidden:invitation",
      `This invitation is for ${view.email}, but you are signed in as ${user.email}. Sign in with the invited address.`,
    );
  }
  return db.transaction(async (tx) => {
    const consumed = await consumeInvitation(tx, view.id, user.id, now);
    if (!consumed) throw new AppError("used:invitation", "This invitation was accepted already.");
    const inserted = await insertMembershipIfAbsent(tx, {
      teamId: view.team.id,
      userId: user.id,
      role: view.role,
    });
    if (!inserted) throw new AppError("conflict:member", "You are a member of this team already.");
    await recordAudit(tx, {
      actorId: user.id,
      teamId: view.team.id,
      action: "invitation.accept",
      target: view.email,
      detail: { role: view.role },
    });
    return view.team;
  });
}

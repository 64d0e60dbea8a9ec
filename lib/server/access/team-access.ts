import type { Executor } from "@/db/client";
import { findTeamWithRoleOfUser } from "@/db/queries/memberships";
import type { Team } from "@/db/schema/teams";
import type { Actor, SignedInActor } from "@/lib/server/accounts/actor";
import { can, ROLE_LABELS, type Capability, type Role } from "@/lib/shared/permissions";
import { AppError } from "@/lib/shared/errors";

export interface TeamContext {
  actor: SignedInActor;
  team: Team;
  role: Role;
}

export const NOT_FOUND_MESSAGE = "There is no such team, or you are not one of its members.";

/**
 * THE team check, used by every team service and (through requireTeamRole) by pages and routes.
 * An unknown team and a team the actor does not belong to answer the same, so nobody learns
 * which slugs exist.
 */
export async function authorizeTeam(
  db: Executor,
  actor: Actor,
  teamSlug: string,
  capability: Capability,
): Promise<TeamContext> {
  if (!actor) throw new AppError("unauthenticated", "Please sign in first.");
  const row = await findTeamWithRoleOfUser(db, teamSlug, actor.id);
  if (!row) throw new AppError("not-found:team", NOT_FOUND_MESSAGE);
  if (!can(row.role, capability)) {
    throw new AppError(
      "forbidden:team",
      `As ${ROLE_LABELS[row.role].toLowerCase()} of this team you may not do that.`,
    );
  }
  return { actor, team: row.team, role: row.role };
}

/** Teams are shared work: joining or founding one needs a confirmed e-mail address. */
export function requireVerified(actor: Actor): SignedInActor {
  if (!actor) throw new AppError("unauthenticated", "Please sign in first.");
  if (!actor.verified) {
    throw new AppError(
      "unverified",
      "Confirm your e-mail address first: use the link we sent you, or ask for a new one on your account page.",
    );
  }
  return actor;
}

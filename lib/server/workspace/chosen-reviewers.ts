import "server-only";

import type { Executor } from "@/db/client";
import { findTeamMembersAmong, VERDICT_ROLES } from "@/db/queries/team-reviewers";
import { AppError } from "@/lib/shared/errors";

const refuse = (message: string) => new AppError("invalid:reviewers", message, "reviewers");

/**
 * Checks whom a review request is asked of: each must be a current reviewer or owner of the
 * team, and not the requester. An id that is no member gets a message without a name, so the
 * answer never tells whether someone outside the team has an account. Returns the ids once each.
 */
export async function checkChosenReviewers(
  db: Executor,
  teamId: string,
  requesterId: string,
  chosen: string[],
): Promise<string[]> {
  const ids = [...new Set(chosen.map((id) => id.toLowerCase()))];
  if (ids.includes(requesterId.toLowerCase())) {
    throw refuse("You cannot review your own request: choose someone else.");
  }
  const members = new Map((await findTeamMembersAmong(db, teamId, ids)).map((m) => [m.id, m]));
  for (const id of ids) {
    const member = members.get(id);
    if (!member) throw refuse("One of the chosen people is not a reviewer of this team.");
    if (!(VERDICT_ROLES as readonly string[]).includes(member.role)) {
      throw refuse(`${member.name} is not a reviewer of this team.`);
    }
  }
  return ids;
}

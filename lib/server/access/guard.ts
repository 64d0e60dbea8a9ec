import "server-only";

import { redirect } from "next/navigation";

import { getDb } from "@/db/index";
import { orNotFound } from "@/lib/server/access/or-not-found";
import { authorizeTeam, type TeamContext } from "@/lib/server/access/team-access";

import type { Capability } from "../../shared/permissions";
import { getActor } from "../accounts/auth/session";

/**
 * The guard for team pages (route handlers go through lib/server/http/route.ts): the signed-in actor must hold `capability` in
 * the team. Anonymous → sign-in; unknown team, foreign team or missing capability → 404 (a page
 * never confirms that a team exists to someone outside it). Actions call the team services,
 * which run the same authorizeTeam check inside.
 */
export async function requireTeamRole(
  teamSlug: string,
  capability: Capability,
): Promise<TeamContext> {
  const actor = await getActor();
  if (!actor) redirect(`/sign-in?next=${encodeURIComponent(`/teams/${teamSlug}`)}`);
  return orNotFound(authorizeTeam(getDb(), actor, teamSlug, capability));
}

import "server-only";

import { getDb } from "@/db/index";

import { requireTeamRole } from "./guard";
import { orNotFound } from "./or-not-found";
import { revisionInTeam } from "./scope";

export type RevisionPageParams = { team: string; id: string; number: string };

/**
 * The one loader of the pages under a revision (conformance, study): the reader must belong to
 * the team, and the scenario and revision must be the team's, else a plain 404.
 */
export async function loadRevisionPage({ team, id, number }: RevisionPageParams) {
  const ctx = await requireTeamRole(team, "team:read");
  const db = getDb();
  const { scenario, revision } = await orNotFound(revisionInTeam(db, ctx.team.id, id, number));
  return {
    ctx,
    db,
    scenario,
    revision,
    scenarioUrl: `/teams/${team}/scenarios/${id}`,
    base: `/teams/${team}/scenarios/${id}/revisions/${number}`,
  };
}

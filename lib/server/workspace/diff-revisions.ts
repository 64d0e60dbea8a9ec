import "server-only";

import type { Db } from "@/db/client";
import type { Actor } from "@/lib/server/accounts/actor";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { authorizeTeam } from "@/lib/server/access/team-access";

import { notFound } from "./errors";
import { diffScenarios, type RevisionDiff } from "../../shared/revision-diff";
import { revisionInTeam } from "../access/scope";

export interface RevisionDiffResponse {
  from: number;
  to: number;
  diff: RevisionDiff;
}

/** Parameters and path of two revisions of one scenario, side by side. */
export async function diffRevisions(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  from: unknown,
  to: unknown,
): Promise<RevisionDiffResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const a = await revisionInTeam(db, ctx.team.id, scenarioId, from);
  const b = await revisionInTeam(db, ctx.team.id, scenarioId, to);
  // Stored files were valid when saved; parsing again fills defaults so both compare alike.
  const left = parseScenarioFile(a.revision.file);
  const right = parseScenarioFile(b.revision.file);
  if (!left.ok || !right.ok) throw notFound("revision");
  return {
    from: a.revision.number,
    to: b.revision.number,
    diff: diffScenarios(left.scenario, right.scenario),
  };
}

import "server-only";

import type { Executor } from "@/db/client";
import type { Actor } from "@/lib/server/accounts/actor";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { parseScenarioFileOrThrow } from "@/lib/server/workspace/parse";
import { revisionInTeam } from "@/lib/server/access/scope";

import { buildReferenceBundle, safeName } from "./build";

/** export → the revision's reference bundle as zip bytes and a file name. */
export async function referenceBundle(
  db: Executor,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  number: unknown,
) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "export");
  const { scenario, revision } = await revisionInTeam(db, ctx.team.id, scenarioId, number);
  const parsed = parseScenarioFileOrThrow(revision.file);
  const bytes = await buildReferenceBundle(revision.file, parsed, {
    team: ctx.team.name,
    scenario: scenario.name,
    revision: revision.number,
    reviewState: revision.reviewState.replace("_", " "),
    createdAt: revision.createdAt.toISOString(),
    generatedAt: new Date().toISOString(),
  });
  return { bytes, fileName: `${safeName(scenario.name)}-r${revision.number}-reference.zip` };
}

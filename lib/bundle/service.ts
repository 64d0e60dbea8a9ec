import type { Executor } from "@/db/client";
import type { Actor } from "@/lib/accounts/actor";
import { authorizeTeam } from "@/lib/teams/access";
import { parseScenarioFileOrThrow } from "@/lib/workspace/parse";
import { revisionInTeam } from "@/lib/workspace/scope";

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

import "server-only";

import type { Executor } from "@/db/client";
import type { Actor } from "@/lib/server/accounts/actor";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { parseScenarioFileOrThrow } from "@/lib/server/workspace/parse";
import { revisionInTeam } from "@/lib/server/access/scope";

import { compute } from "@/lib/server/compute/pool";

import { safeName } from "./build";

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
  // The load cases run the core once per set and case: in the compute pool, like the report's curves.
  const identity = {
    team: ctx.team.name,
    scenario: scenario.name,
    revision: revision.number,
    reviewState: revision.reviewState.replace("_", " "),
    createdAt: revision.createdAt.toISOString(),
    generatedAt: new Date().toISOString(),
  };
  const bytes = await compute<Uint8Array>(
    { kind: "reference-bundle", file: revision.file, scenario: parsed, identity },
    ctx.actor.id,
    "reference bundle",
  );
  return { bytes, fileName: `${safeName(scenario.name)}-r${revision.number}-reference.zip` };
}

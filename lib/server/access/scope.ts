import type { Executor } from "@/db/client";
import { findRevisionRow } from "@/db/queries/revisions";
import { findScenarioRow } from "@/db/queries/scenarios";
import type { RevisionRow, ScenarioRow } from "@/db/schema/scenarios";

import { notFound, requireRevisionNumber, requireUuid } from "../workspace/errors";

// Lookups that turn URL ids into rows of the actor's team, or a plain 404. Another team's ids
// fail exactly like ids that never existed.

export async function scenarioInTeam(
  db: Executor,
  teamId: string,
  scenarioId: unknown,
  lock = false,
): Promise<ScenarioRow> {
  const row = await findScenarioRow(db, teamId, requireUuid(scenarioId, "scenario"), lock);
  if (!row) throw notFound("scenario");
  return row;
}

export async function revisionInTeam(
  db: Executor,
  teamId: string,
  scenarioId: unknown,
  number: unknown,
): Promise<{ scenario: ScenarioRow; revision: RevisionRow }> {
  const scenario = await scenarioInTeam(db, teamId, scenarioId);
  const revision = await findRevisionRow(db, scenario.id, requireRevisionNumber(number));
  if (!revision) throw notFound("revision");
  return { scenario, revision };
}

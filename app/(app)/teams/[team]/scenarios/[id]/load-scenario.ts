import "server-only";

import { readDeskExtras } from "@/lib/scenario/desk-extras";

import { notFound } from "next/navigation";

import type { Db } from "@/db/client";
import { findRevisionRow, listRevisionsOfScenario } from "@/db/queries/revisions";
import { findScenarioSummary } from "@/db/queries/scenarios";
import { parseScenarioFile, type Scenario } from "@/lib/scenario/scenario-schema";
import type { OpenedScenario } from "@/lib/client/loading-desk/scenario-state";
import { isUuid } from "@/lib/shared/uuid";

const NUMBER = /^[1-9][0-9]{0,8}$/;

function one(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value[0] : value;
}

/** A revision number from the address; anything malformed is simply not found. */
export function revisionParam(value: string | string[] | undefined): number | undefined {
  const text = one(value);
  if (text === undefined || text === "") return undefined;
  if (!NUMBER.test(text)) notFound();
  return Number(text);
}

async function loadFile(db: Db, scenarioId: string, number: number) {
  const row = await findRevisionRow(db, scenarioId, number);
  if (!row) notFound();
  const parsed = parseScenarioFile(row.file);
  // Stored files were validated on save; a file that no longer parses is not shown half-read.
  if (!parsed.ok) notFound();
  const opened: OpenedScenario = { ...parsed.scenario, desk: readDeskExtras(row.file) };
  return { scenario: parsed.scenario as Scenario, opened };
}

/** Scenario, the revision asked for (latest by default), optional overlay, and the history. */
export async function loadScenarioPage(
  db: Db,
  teamId: string,
  id: string,
  rev: number | undefined,
  overlay: number | undefined,
) {
  if (!isUuid(id)) notFound();
  const summary = await findScenarioSummary(db, teamId, id.toLowerCase());
  if (!summary) notFound();
  const number = rev ?? summary.latestRevision.number;
  const [current, other, revisions] = await Promise.all([
    loadFile(db, summary.id, number),
    overlay !== undefined && overlay !== number ? loadFile(db, summary.id, overlay) : null,
    listRevisionsOfScenario(db, summary.id),
  ]);
  const meta = revisions.find((r) => r.number === number);
  if (!meta) notFound();
  return { summary, number, meta, current, other, revisions };
}

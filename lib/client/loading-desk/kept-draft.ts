/**
 * A draft of unsaved desk edits kept in this browser, one per scenario and base revision, so an
 * engineer who leaves the page (or loses the tab) gets the work offered back. Pure: the caller
 * owns localStorage. A stored value that is not a valid draft is ignored, never trusted.
 */
import { z } from "zod";
import { readDeskExtras } from "@/lib/scenario/desk-extras";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { initModel } from "./loading-desk-reducer";
import {
  fromScenario,
  type OpenedScenario,
  type ScenarioFileJson,
  toScenarioFile,
} from "./scenario-state";

const DRAFT_VERSION = 1;

export interface DraftPlace {
  team: string;
  scenarioId: string;
  /** The revision the edits start from: a draft on revision 3 is not offered on revision 4. */
  baseRevision: number;
}

export interface KeptDraft {
  savedAt: Date;
  scenario: OpenedScenario;
}

export function draftKey({ team, scenarioId, baseRevision }: DraftPlace): string {
  return `craquelure.draft.v${DRAFT_VERSION}:${team}:${scenarioId}:${baseRevision}`;
}

/** The file the desk writes for a scenario as opened, untouched: what "no changes" looks like. */
export function deskFileOf(opened: OpenedScenario): ScenarioFileJson {
  const model = initModel(fromScenario(opened, opened));
  return toScenarioFile(model, model.doc);
}

/** JSON with object keys sorted: a form that rebuilds a set in another key order changes nothing. */
function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === "object" && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : v,
  );
}

/** True when the desk's file says anything the saved revision does not. */
export function differsFromSaved(current: ScenarioFileJson, saved: ScenarioFileJson): boolean {
  return canonicalJson(current) !== canonicalJson(saved);
}

export function serializeDraft(file: ScenarioFileJson, savedAt: Date): string {
  return JSON.stringify({ version: DRAFT_VERSION, savedAt: savedAt.toISOString(), file });
}

const storedDraftSchema = z.object({
  version: z.literal(DRAFT_VERSION),
  savedAt: z.iso.datetime(),
  file: z.unknown(),
});

/** The draft in a stored string, or null when there is none or it is damaged or outdated. */
export function readDraft(stored: string | null): KeptDraft | null {
  if (!stored) return null;
  let json: unknown;
  try {
    json = JSON.parse(stored);
  } catch {
    return null;
  }
  const envelope = storedDraftSchema.safeParse(json);
  if (!envelope.success) return null;
  const parsed = parseScenarioFile(envelope.data.file);
  if (!parsed.ok) return null;
  return {
    savedAt: new Date(envelope.data.savedAt),
    scenario: { ...parsed.scenario, desk: readDeskExtras(envelope.data.file) },
  };
}

/** "4 Dec 2026, 16:40" in the reader's own time zone. */
export function draftTimeText(savedAt: Date, locale?: string): string {
  return savedAt.toLocaleString(locale, { dateStyle: "medium", timeStyle: "short" });
}

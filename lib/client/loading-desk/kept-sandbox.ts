/**
 * The sandbox's scenario kept in this browser while its engineer signs in: the sign-in page and
 * its redirect drop the address's "#s=…", so without this the desk would reopen on the template.
 * One slot, read when the sandbox opens again and forgotten once the desk has it (the reading and
 * the forgetting are apart: React may run a state initializer twice). Pure: the caller owns the
 * storage. A stored value that is not a valid scenario file, or is older than a day, is ignored.
 */
import { z } from "zod";
import { readDeskExtras } from "@/lib/scenario/desk-extras";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import type { OpenedScenario, ScenarioFileJson } from "./scenario-state";

export const KEPT_SANDBOX_KEY = "craquelure.sandbox-kept.v1";

// Long enough for sign-up and the e-mail confirmation; short enough that a shared browser does
// not offer one person's scratch work to the next a week later.
const KEEP_FOR_MS = 24 * 60 * 60 * 1000;

/** The storage calls used: localStorage fits, so does a Map-backed fake in tests. */
export type KeepStorage = Pick<Storage, "getItem" | "setItem" | "removeItem">;

const storedSchema = z.object({ keptAt: z.iso.datetime(), file: z.unknown() });

/** Keeps the file; false when the browser refuses storage (private mode, quota). */
export function keepSandboxScenario(
  storage: KeepStorage,
  file: ScenarioFileJson,
  now = new Date(),
): boolean {
  try {
    storage.setItem(KEPT_SANDBOX_KEY, JSON.stringify({ keptAt: now.toISOString(), file }));
    return true;
  } catch {
    return false;
  }
}

/** The kept scenario parsed like an imported file, or null when there is none worth opening. */
export function readKeptSandboxScenario(
  storage: KeepStorage,
  now = new Date(),
): OpenedScenario | null {
  let stored: string | null;
  try {
    stored = storage.getItem(KEPT_SANDBOX_KEY);
  } catch {
    return null;
  }
  if (!stored) return null;
  let json: unknown;
  try {
    json = JSON.parse(stored);
  } catch {
    return null;
  }
  const envelope = storedSchema.safeParse(json);
  if (!envelope.success) return null;
  const age = now.getTime() - new Date(envelope.data.keptAt).getTime();
  if (age < 0 || age > KEEP_FOR_MS) return null;
  const parsed = parseScenarioFile(envelope.data.file);
  if (!parsed.ok) return null;
  return { ...parsed.scenario, desk: readDeskExtras(envelope.data.file) };
}

/** Empties the slot: once the desk has reopened the work, and after a save. */
export function forgetKeptSandboxScenario(storage: KeepStorage): void {
  try {
    storage.removeItem(KEPT_SANDBOX_KEY);
  } catch {
    // Storage refused: nothing was kept either.
  }
}

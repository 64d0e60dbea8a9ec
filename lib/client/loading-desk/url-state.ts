/**
 * The sandbox state in the address (`#s=<lz-string>`), so a scenario travels as a link without
 * an account. Decoding validates like an imported file.
 */
import { readDeskExtras } from "@/lib/scenario/desk-extras";
import LZString from "lz-string";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { type OpenedScenario, type ScenarioFileJson } from "./scenario-state";

export const URL_STATE_KEY = "s";

export function encodeState(file: ScenarioFileJson): string {
  return LZString.compressToEncodedURIComponent(JSON.stringify(file));
}

export type DecodeResult = { ok: true; scenario: OpenedScenario } | { ok: false; errors: string[] };

export function decodeState(encoded: string): DecodeResult {
  const text = LZString.decompressFromEncodedURIComponent(encoded);
  if (!text) return { ok: false, errors: ["the link's scenario is cut off or damaged"] };
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    return { ok: false, errors: ["the link's scenario is not valid JSON"] };
  }
  const parsed = parseScenarioFile(json);
  if (!parsed.ok) return parsed;
  const extras = readDeskExtras(json);
  return { ok: true, scenario: { ...parsed.scenario, desk: extras } };
}

/** The encoded state from a location hash like "#s=…", or null. */
export function readHash(hash: string): string | null {
  // Not URLSearchParams: it would turn the codec's "+" into a space.
  for (const part of hash.replace(/^#/, "").split("&")) {
    if (part.startsWith(`${URL_STATE_KEY}=`)) return part.slice(URL_STATE_KEY.length + 1);
  }
  return null;
}

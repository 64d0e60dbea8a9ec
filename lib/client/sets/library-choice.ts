/**
 * A team library parameter set as the set picker offers it: the values ready to add to a
 * scenario and one line saying where they came from (records by name, who, when).
 */
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

export interface LibrarySetLike {
  id: string;
  name: string;
  values: Record<string, unknown>;
  provenance: { kind: string; records?: string[]; method?: string };
  createdBy: { name: string } | null;
  createdAt: string;
  /** the library version these values are (1 when the set was never edited) */
  version?: number;
}

export interface LibraryChoice {
  key: string;
  name: string;
  /** Team name when the picker offers several teams' libraries (the sandbox). */
  team?: string;
  provenance: string;
  /** the set's current version, shown beside its name: the values added are that version's */
  version: number;
  params: Omit<ParameterSet, "id">;
}

// Fits store each record as "name (uuid)" so the trail survives a rename; people read the name.
const TRAILING_ID = /\s*\([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}\)$/i;

export function recordNameOf(entry: string): string {
  return entry.replace(TRAILING_ID, "");
}

/** "fitted from CT-01, CT-02 by Ada Editor, 2026-12-03" or "typed in by …, …". */
export function libraryProvenanceText(set: LibrarySetLike): string {
  const p = set.provenance;
  const who = set.createdBy?.name ?? "a former member";
  const when = set.createdAt.slice(0, 10);
  let what = "typed in";
  if (p.kind === "fitted") {
    const names = (p.records ?? []).map(recordNameOf);
    what = names.length ? `fitted from ${names.join(", ")}` : "fitted";
  } else if (p.kind === "constituents") what = "derived from constituents";
  return `${what} by ${who}, ${when}`;
}

/** The set's values under the library name; the name is what the report matches provenance by. */
export function toLibraryChoice(set: LibrarySetLike, team?: string): LibraryChoice {
  const { id: _id, ...values } = set.values as Record<string, unknown>;
  return {
    key: `library:${set.id}`,
    name: set.name,
    team,
    provenance: libraryProvenanceText(set),
    version: set.version ?? 1,
    params: { ...values, label: set.name } as Omit<ParameterSet, "id">,
  };
}

/** "SMC fit December (version 2)": the name with the version the picker would add. */
export function choiceTitle(choice: LibraryChoice): string {
  return `${choice.name} (version ${choice.version})`;
}

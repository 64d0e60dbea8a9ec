import "server-only";

import { randomUUID } from "node:crypto";

import type { NewParameterSet, NewParameterSetVersion } from "@/db/queries/parameter-sets";
import type { ParameterSetProvenance } from "@/db/schema/parameter-sets";
import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";

import type { ExportPerson, TeamExport } from "./export-schema";

type ExportSet = TeamExport["parameterSets"][number];

/**
 * The library rows of an import: each set and its versions. A file from before versions
 * existed carries none, so its sets arrive as version 1 of what the file holds.
 */
export function importedSetRows(
  doc: TeamExport,
  teamId: string,
  idOf: (p: ExportPerson) => string | null,
): { sets: NewParameterSet[]; versions: NewParameterSetVersion[] } {
  const sets: NewParameterSet[] = [];
  const versions: NewParameterSetVersion[] = [];
  for (const s of doc.parameterSets) {
    const id = randomUUID();
    // Valid (checked before); parsing again gives the stored shape with defaults filled.
    const values = parameterSetSchema.parse(s.values);
    const provenance = s.provenance as ParameterSetProvenance;
    const history = historyOf(s);
    const version = history ? history[history.length - 1].version : 1;
    sets.push({
      id,
      teamId,
      name: s.name,
      values,
      provenance,
      version,
      createdBy: idOf(s.createdBy),
      updatedBy: idOf(s.updatedBy),
      createdAt: new Date(s.createdAt),
      updatedAt: new Date(s.updatedAt),
    });
    if (!history) {
      versions.push({
        setId: id,
        version: 1,
        values,
        provenance,
        createdBy: idOf(s.updatedBy),
        createdAt: new Date(s.updatedAt),
      });
      continue;
    }
    for (const v of history) {
      versions.push({
        setId: id,
        version: v.version,
        values: parameterSetSchema.parse(v.values),
        provenance: v.provenance as ParameterSetProvenance,
        createdBy: idOf(v.createdBy),
        createdAt: new Date(v.createdAt),
      });
    }
  }
  return { sets, versions };
}

/** The file's versions of a set, oldest first; undefined when the file has none. */
function historyOf(s: ExportSet) {
  if (!s.versions || s.versions.length === 0) return undefined;
  return [...s.versions].sort((a, b) => a.version - b.version);
}

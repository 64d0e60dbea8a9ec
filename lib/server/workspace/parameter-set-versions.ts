import type { Db } from "@/db/client";
import {
  listParameterSetVersionRows,
  type ParameterSetVersionView,
} from "@/db/queries/parameter-sets";
import type { PersonRef } from "@/db/queries/users-view";
import { changedParameters, sameJson } from "@/lib/shared/parameter-set-changes";

/** One line of a set's history, as the API and the set's page show it. */
export interface ParameterSetVersionSummary {
  version: number;
  createdBy: PersonRef | null;
  createdAt: string;
  /** Parameters whose values differ from the previous version; empty for version 1. */
  changed: string[];
  /** True when the set's origin (provenance) differs from the previous version's. */
  provenanceChanged: boolean;
}

/** Summarises versions of one set, ordered oldest first, against their predecessors. */
export function summariseVersions(rows: ParameterSetVersionView[]): ParameterSetVersionSummary[] {
  return rows.map((row, i) => {
    const previous = i > 0 ? rows[i - 1] : undefined;
    return {
      version: row.version,
      createdBy: row.createdBy,
      createdAt: row.createdAt,
      changed: previous ? changedParameters(previous.values, row.values) : [],
      provenanceChanged: previous ? !sameJson(previous.provenance, row.provenance) : false,
    };
  });
}

export async function listVersions(db: Db, teamId: string, setId: string) {
  return summariseVersions(await listParameterSetVersionRows(db, teamId, setId));
}

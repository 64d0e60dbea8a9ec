import "server-only";

/**
 * Where each parameter set of a revision came from: the team library set with the same name
 * (the set's label) or the same values, its provenance, and the fit that produced it with the
 * records it used and their RMS residuals. Pure, so the matching rules are tested directly.
 */
import type { FitUncertainty } from "@/lib/calibration/uncertainty";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

type LibraryProvenance = { kind: string; method?: string; records?: string[]; note?: string };

export interface LibrarySet {
  id: string;
  name: string;
  /** the current version's values and provenance */
  values: Record<string, unknown>;
  provenance: LibraryProvenance;
  /** the current version's number (1 when the caller does not know of versions) */
  version?: number;
  /** every version of the set, the current one included; a revision may use a superseded one */
  versions?: { version: number; values: Record<string, unknown>; provenance: LibraryProvenance }[];
}

export interface FitSummary {
  parameterSetId: string | null;
  method: string;
  recordIds: string[];
  residuals: { id: string; rms: number; points: number }[];
  /** Stored with the fit (issue 14: isotropy tie, values not informed by these records). */
  warnings?: string[];
  /** Stored with a refinement (issue 14): standard errors, intervals, correlations. */
  uncertainty?: FitUncertainty | null;
  createdAt: string;
}

export interface SetProvenance {
  setId: string;
  libraryName: string | null;
  /** the library version whose values the set has, and the set's latest version */
  libraryVersion: number | null;
  latestVersion: number | null;
  /** e.g. "library set 'X', version 1 (superseded by version 2)"; null for a typed-in set */
  librarySource: string | null;
  kind: string;
  method: string | null;
  note: string | null;
  records: { name: string; rms: number | null; points: number | null }[];
  fittedAt: string | null;
  warnings: string[];
  uncertainty: FitUncertainty | null;
  /** the set's damage law: the unit of a1, a2 depends on it */
  law: ParameterSet["law"];
}

const NUMERIC = [
  "E1",
  "E2",
  "nu12",
  "G12",
  "Y0_1",
  "Y0_2",
  "a1",
  "a2",
  "b",
  "k6",
  "alpha",
  "beta",
  "dcrit",
];

// Defaults of spec A.3 for keys a stored set may lack: a missing k6 is the default 1.
const DEFAULTS: Record<string, unknown> = { k6: 1 };

function sameValues(set: ParameterSet, values: Record<string, unknown>): boolean {
  const own = set as unknown as Record<string, unknown>;
  return NUMERIC.every((k) => (own[k] ?? DEFAULTS[k]) === (values[k] ?? DEFAULTS[k]));
}

interface Candidate {
  lib: LibrarySet;
  version: number;
  latest: number;
  values: Record<string, unknown>;
  provenance: LibraryProvenance;
}

/** Each library set's versions, the current one first so an exact match prefers it. */
function candidatesOf(library: LibrarySet[]): Candidate[] {
  return library.flatMap((lib) => {
    const latest = lib.version ?? 1;
    const current: Candidate = {
      lib,
      version: latest,
      latest,
      values: lib.values,
      provenance: lib.provenance,
    };
    const older = (lib.versions ?? [])
      .filter((v) => v.version !== latest)
      .sort((a, b) => b.version - a.version)
      .map((v) => ({
        lib,
        version: v.version,
        latest,
        values: v.values,
        provenance: v.provenance,
      }));
    return [current, ...older];
  });
}

/** The library set's name and version as the report says it. */
export function librarySourceText(name: string, version: number, latest: number): string {
  const superseded = version < latest ? ` (superseded by version ${latest})` : "";
  return `library set '${name}', version ${version}${superseded}`;
}

function findCandidate(set: ParameterSet, candidates: Candidate[]): Candidate | null {
  const byValues = (c: Candidate) => sameValues(set, c.values);
  // Current versions before superseded ones, and the set's own name before a namesake.
  const current = candidates.filter((c) => c.version === c.latest);
  const older = candidates.filter((c) => c.version !== c.latest);
  const named = (c: Candidate) => set.label !== "" && c.lib.name === set.label && byValues(c);
  return (
    current.find(named) ??
    older.find(named) ??
    current.find(byValues) ??
    older.find(byValues) ??
    null
  );
}

export function matchProvenance(
  sets: ParameterSet[],
  library: LibrarySet[],
  fits: FitSummary[],
  recordNames: Map<string, string>,
): SetProvenance[] {
  const candidates = candidatesOf(library);
  return sets.map((set) => {
    const match = findCandidate(set, candidates);
    const lib = match?.lib ?? null;
    const origin = match?.provenance;
    const fit = lib ? fits.find((f) => f.parameterSetId === lib.id) : undefined;
    const recordIds = fit?.recordIds ?? origin?.records ?? [];
    return {
      setId: set.id,
      libraryName: lib?.name ?? null,
      libraryVersion: match?.version ?? null,
      latestVersion: match?.latest ?? null,
      librarySource: match ? librarySourceText(match.lib.name, match.version, match.latest) : null,
      kind: origin?.kind ?? "typed into the scenario",
      method: fit?.method ?? origin?.method ?? null,
      note: origin?.note ?? null,
      records: recordIds.map((id) => {
        const residual = fit?.residuals.find((r) => r.id === id);
        return {
          name: recordNames.get(id) ?? id,
          rms: residual?.rms ?? null,
          points: residual?.points ?? null,
        };
      }),
      fittedAt: fit?.createdAt ?? null,
      warnings: fit?.warnings ?? [],
      uncertainty: fit?.uncertainty ?? null,
      law: set.law,
    };
  });
}

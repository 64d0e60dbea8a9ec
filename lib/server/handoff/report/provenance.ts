import "server-only";

/**
 * Where each parameter set of a revision came from: the team library set with the same name
 * (the set's label) or the same values, its provenance, and the fit that produced it with the
 * records it used and their RMS residuals. Pure, so the matching rules are tested directly.
 */
import type { FitUncertainty } from "@/lib/calibration/uncertainty";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

export interface LibrarySet {
  id: string;
  name: string;
  values: Record<string, unknown>;
  provenance: { kind: string; method?: string; records?: string[]; note?: string };
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
  "alpha",
  "beta",
  "dcrit",
];

function sameValues(set: ParameterSet, values: Record<string, unknown>): boolean {
  return NUMERIC.every((k) => (set as unknown as Record<string, unknown>)[k] === values[k]);
}

export function matchProvenance(
  sets: ParameterSet[],
  library: LibrarySet[],
  fits: FitSummary[],
  recordNames: Map<string, string>,
): SetProvenance[] {
  return sets.map((set) => {
    const lib =
      library.find((l) => set.label !== "" && l.name === set.label && sameValues(set, l.values)) ??
      library.find((l) => sameValues(set, l.values)) ??
      null;
    const fit = lib ? fits.find((f) => f.parameterSetId === lib.id) : undefined;
    const recordIds = fit?.recordIds ?? lib?.provenance.records ?? [];
    return {
      setId: set.id,
      libraryName: lib?.name ?? null,
      kind: lib?.provenance.kind ?? "typed into the scenario",
      method: fit?.method ?? lib?.provenance.method ?? null,
      note: lib?.provenance.note ?? null,
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

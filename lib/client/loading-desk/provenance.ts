/**
 * The provenance side file of a results CSV (issue 15 item 3): which scenario, revision, sets and
 * values made the numbers, when, how they are written, and the caution. A separate JSON file and
 * not "#" lines in the CSV, because spreadsheets and pandas read comment lines as data unless
 * told otherwise; the two files share a name (file-names.ts) so they travel together.
 */
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { CAUTION_LINES } from "@/lib/shared/caution";
import { EXPORT_HEADINGS, EXPORT_SIGNIFICANT_DIGITS } from "./export-columns";

export interface ProvenanceInput {
  scenario: string;
  /** "revision 4" on a saved revision; null on scratch data (sandbox, new scenario). */
  revision: string | null;
  sets: readonly ParameterSet[];
  /** The load path as the scenario file holds it. */
  path: unknown;
  csvFile: string;
  date?: Date;
}

export function provenance(input: ProvenanceInput) {
  return {
    about: "Provenance of a Craquelure results CSV",
    csvFile: input.csvFile,
    scenario: input.scenario,
    revision: input.revision ?? "not saved (scratch data)",
    exportedAt: (input.date ?? new Date()).toISOString(),
    numbers: `${EXPORT_SIGNIFICANT_DIGITS} significant digits`,
    units: Object.values(EXPORT_HEADINGS),
    sets: input.sets.map(({ id, label, ...values }) => ({ id, label, values })),
    path: input.path,
    caution: [...CAUTION_LINES],
  };
}

export function provenanceText(input: ProvenanceInput): string {
  return JSON.stringify(provenance(input), null, 2) + "\n";
}

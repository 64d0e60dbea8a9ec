import "server-only";

import type { loadTeamRecordsAndFits } from "@/db/queries/team-export";

import type { ExportFit, ExportPerson, ExportTestRecord } from "./export-schema";

type Rows = Awaited<ReturnType<typeof loadTeamRecordsAndFits>>;

/**
 * The team's test records with their original files, and its fits, for the team export. A
 * record's key is its id here; fits and the scenario files' overlays keep naming records by it,
 * and the import rewrites all of them to the new ids.
 */
export function exportRecordsAndFits(
  { recordRows, fitRows }: Rows,
  who: (id: string | null) => ExportPerson,
): { testRecords: ExportTestRecord[]; fits: ExportFit[] } {
  return {
    testRecords: recordRows.map((r) => ({
      key: r.id,
      name: r.name,
      testType: r.testType as ExportTestRecord["testType"],
      loading: r.loading as ExportTestRecord["loading"],
      specimenId: r.specimenId,
      orientation: r.orientation,
      strainRate: r.strainRate,
      temperature: r.temperature,
      laboratory: r.laboratory,
      notes: r.notes,
      couponOrientation: r.couponOrientation ?? null,
      mapping: r.mapping as ExportTestRecord["mapping"],
      headers: r.headers,
      warnings: r.warnings,
      points: r.points,
      file: { name: r.fileName, size: r.fileSize, sha256: r.fileSha256, text: r.fileText },
      createdBy: who(r.createdBy),
      createdAt: r.createdAt.toISOString(),
    })),
    fits: fitRows.map(({ fit, parameterSetName }) => ({
      recordKeys: fit.recordIds,
      method: fit.method,
      options: fit.options,
      params: fit.params as unknown as Record<string, unknown>,
      // Plain JSON rows keyed by record id; the import rewrites the ids.
      reports: fit.reports as unknown as ExportFit["reports"],
      residuals: fit.residuals as unknown as ExportFit["residuals"],
      warnings: fit.warnings,
      uncertainty: (fit.uncertainty ?? null) as Record<string, unknown> | null,
      parameterSet: parameterSetName,
      createdBy: who(fit.createdBy),
      createdAt: fit.createdAt.toISOString(),
    })),
  };
}

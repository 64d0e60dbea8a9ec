import "server-only";

import { createHash, randomUUID } from "node:crypto";

import type { NewImportedFit, NewImportedRecord } from "@/db/queries/workspace-import";
import type { MaterialParams } from "@/lib/mechanics/types";
import type { RecordReport } from "@/lib/calibration/identify";
import type { RecordResidual } from "@/lib/calibration/refine";
import type { FitUncertainty } from "@/lib/calibration/uncertainty";
import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";
import { AppError } from "@/lib/shared/errors";

import type { ExportPerson, ExportTestRecord, TeamExport } from "./export-schema";

function invalid(where: string, message: string): never {
  throw new AppError("invalid:import", message, where);
}

const recordWords = (r: ExportTestRecord) => `Test record '${r.name}'`;

/**
 * Checks the test records and fits of a team export before anything is written: each record's
 * original file still has the size and sha-256 it was exported with (a changed file would no
 * longer be the bytes the fits were made from), its channels have one value per row, keys are
 * unique, and each fit's values pass the scenario module's parameter-set schema.
 */
export function checkRecordsAndFits(doc: TeamExport): void {
  const keys = new Set<string>();
  doc.testRecords.forEach((record, i) => {
    const where = `testRecords[${i}]`;
    const key = record.key.toLowerCase();
    if (keys.has(key)) invalid(`${where}.key`, `${recordWords(record)} appears twice in the file.`);
    keys.add(key);
    const sha = createHash("sha256").update(record.file.text, "utf8").digest("hex");
    if (sha !== record.file.sha256) {
      invalid(
        `${where}.file.sha256`,
        `${recordWords(record)}: its original file '${record.file.name}' does not match the sha-256 checksum it was exported with, so it was changed after export. Use the file as the export wrote it.`,
      );
    }
    if (Buffer.byteLength(record.file.text, "utf8") !== record.file.size) {
      invalid(
        `${where}.file.size`,
        `${recordWords(record)}: its original file '${record.file.name}' is not the size it was exported with.`,
      );
    }
    const rows = record.points.strain.length;
    const channels = Object.values(record.points).filter((c) => c !== undefined);
    if (rows === 0 || channels.some((c) => c.length !== rows)) {
      invalid(
        `${where}.points`,
        `${recordWords(record)}: its points must have one value of each quantity per row, and at least one row.`,
      );
    }
  });
  doc.fits.forEach((fit, i) => {
    const parsed = parameterSetSchema.safeParse(fit.params);
    if (!parsed.success) {
      const first = parsed.error.issues[0];
      const field = first?.path.length ? `${first.path.join(".")}: ` : "";
      invalid(
        `fits[${i}].params`,
        `Fit ${i + 1} in the file has values that are not valid (${field}${first?.message ?? "invalid"}).`,
      );
    }
  });
}

export interface PlannedRecordsAndFits {
  records: NewImportedRecord[];
  /** Fits without their parameter set id: that is known only once the sets are inserted. */
  fits: (Omit<NewImportedFit, "parameterSetId"> & { parameterSetName: string | null })[];
  /** Old record id (lower case) → new id, for the fits and the scenario files' overlays. */
  newIdOf: Map<string, string>;
}

/** New ids for every record, and fits rewritten to them. Call after checkRecordsAndFits. */
export function planRecordsAndFits(
  doc: TeamExport,
  teamId: string,
  idOf: (p: ExportPerson) => string | null,
): PlannedRecordsAndFits {
  const newIdOf = new Map<string, string>();
  const records: NewImportedRecord[] = doc.testRecords.map((r) => {
    const id = randomUUID();
    newIdOf.set(r.key.toLowerCase(), id);
    return {
      id,
      teamId,
      name: r.name,
      testType: r.testType,
      loading: r.loading,
      specimenId: r.specimenId,
      orientation: r.orientation,
      strainRate: r.strainRate,
      temperature: r.temperature,
      laboratory: r.laboratory,
      notes: r.notes,
      couponOrientation: r.couponOrientation,
      mapping: r.mapping,
      headers: r.headers,
      warnings: r.warnings,
      points: r.points,
      pointCount: r.points.strain.length,
      fileName: r.file.name,
      fileSize: r.file.size,
      fileSha256: r.file.sha256,
      fileText: r.file.text,
      createdBy: idOf(r.createdBy),
      createdAt: new Date(r.createdAt),
    };
  });
  const setNames = new Set(doc.parameterSets.map((s) => s.name));
  const renamed = (id: string) => newIdOf.get(id.toLowerCase()) ?? id;
  // What is left out here is said by teamImportNotes (lib/shared), the same words the page shows.
  const fits = doc.fits.map((f) => {
    const recordIds = f.recordKeys.flatMap((k) => newIdOf.get(k.toLowerCase()) ?? []);
    const parameterSetName =
      f.parameterSet !== null && setNames.has(f.parameterSet) ? f.parameterSet : null;
    const { id: _id, label: _label, ...params } = parameterSetSchema.parse(f.params);
    return {
      teamId,
      recordIds,
      method: f.method,
      options: f.options,
      params: params as MaterialParams,
      reports: f.reports.map((r) => ({ ...r, id: renamed(r.id) })) as unknown as RecordReport[],
      residuals: f.residuals.map((r) => ({
        ...r,
        id: renamed(r.id),
      })) as unknown as RecordResidual[],
      warnings: f.warnings,
      uncertainty: f.uncertainty as FitUncertainty | null,
      parameterSetName,
      createdBy: idOf(f.createdBy),
      createdAt: new Date(f.createdAt),
    };
  });
  return { records, fits, newIdOf };
}

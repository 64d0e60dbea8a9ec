import "server-only";

import { createHash } from "node:crypto";

import type { Db } from "@/db/client";
import { insertTestRecord } from "@/db/queries/test-records";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import type { CsvError } from "@/lib/csv/csv-error";
import { compute } from "@/lib/server/compute/pool";
import type { CurveCsvOutcome } from "@/lib/server/compute/worker/task-types";
import { AppError } from "@/lib/shared/errors";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { DetailedAppError } from "@/lib/server/workspace/errors";
import { parseWithPath } from "@/lib/server/workspace/parse";

import type { StoredMapping } from "@/db/schema/test-records";
import type { Conversion } from "@/lib/csv/convert-quantities";
import type { CurvePoints } from "@/lib/csv/extract-points";
import type { FileLayout } from "@/lib/csv/file-layout";
import type { RecordMapping } from "@/lib/csv/record-mapping";
import type { ColumnMappingChoice } from "@/lib/csv/record-schema";

import { toStoredPoints } from "../../shared/records/stored-points";
import { nameFromFile, uploadTestRecordSchema } from "./upload-schema";

/** A file error as the API answers it: the message names the line and the cell. */
function csvFailure(error: CsvError): AppError {
  const code = error.code === "too-large" ? "invalid:too-large" : "invalid:csv";
  return new DetailedAppError(
    code,
    error.message,
    { line: error.line, column: error.column, reason: error.code },
    "text",
  );
}

/**
 * The record's mapping as stored: the columns extracted (a derived column's index is past the
 * file's own, see `headers`), the units applied, and for a force/extension file the raw columns,
 * their units and the geometry that made stress and strain; the layout the file was read with.
 */
function storedMapping(
  input: RecordMapping,
  choice: ColumnMappingChoice,
  conversion: Conversion,
  layout: FileLayout,
  points: CurvePoints,
): StoredMapping {
  const { strainUnit: _s, stressUnit: _t, ...columns } = choice;
  const stored: StoredMapping = {
    ...columns,
    strainUnit: points.strainUnit,
    stressUnit: points.stressUnit,
    layout,
  };
  if (input.force !== undefined && conversion.forceColumn !== undefined) stored.force = input.force;
  if (input.extension !== undefined && conversion.extensionColumn !== undefined)
    stored.extension = input.extension;
  if (conversion.forceColumn !== undefined || conversion.extensionColumn !== undefined) {
    stored.conversion = conversion;
    stored.geometry = input.geometry;
  }
  return stored;
}

/**
 * Re-parses the file on the server with the same lib/csv code the browser used, and stores the
 * original text with the parsed points in one transaction. Any error saves nothing.
 */
export async function uploadTestRecord(db: Db, actor: Actor, teamSlug: string, input: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "test-record:edit");
  const data = parseWithPath(uploadTestRecordSchema, input);
  // The same lib/csv reader, in the compute pool: a hostile file cannot hold the request thread.
  const read = await compute<CurveCsvOutcome>(
    { kind: "read-curve-csv", text: data.text, mapping: data.mapping },
    ctx.actor.id,
    "file reading",
  );
  if (!read.ok) throw csvFailure(read.error);
  const { points, headers, warnings, choice, conversion, layout } = read;
  const bytes = Buffer.from(data.text, "utf8");
  const name = data.name || nameFromFile(data.fileName);
  return db.transaction(async (tx) => {
    const id = await insertTestRecord(tx, {
      teamId: ctx.team.id,
      name,
      ...data.meta,
      strainRate: data.meta.strainRate ?? null,
      temperature: data.meta.temperature ?? null,
      laboratory: data.meta.laboratory || null,
      notes: data.meta.notes || null,
      couponOrientation: data.meta.couponOrientation ?? null,
      mapping: storedMapping(data.mapping, choice, conversion, layout, points),
      headers,
      warnings,
      points: toStoredPoints(points),
      pointCount: points.strain.length,
      fileName: data.fileName,
      fileSize: bytes.byteLength,
      fileSha256: createHash("sha256").update(bytes).digest("hex"),
      fileText: data.text,
      createdBy: ctx.actor.id,
    });
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "test-record.create",
      target: id,
      detail: { name, fileName: data.fileName, points: points.strain.length },
    });
    return { id, name, pointCount: points.strain.length, warnings };
  });
}

import { z } from "zod";

import { REVIEW_STATES } from "@/lib/shared/validations/workspace";
import { provenanceSchema } from "@/lib/shared/validations/parameter-sets";
import { INT4_MAX } from "@/lib/shared/validations/int4";

import { exportFitSchema, exportTestRecordSchema } from "./team-export-records";

// The team export file. People travel as e-mail + name (ids mean nothing elsewhere); keys are
// the exporting installation's ids, used only to tie replies to their parent inside the file.

export const TEAM_EXPORT_FORMAT = "craquelure.team-export/1";

const iso = z.iso.datetime({ offset: true, error: "must be an ISO date-time" });
const person = z.object({ email: z.string().max(320), name: z.string().max(200) }).nullable();
const state = z.enum(REVIEW_STATES);

const commentSchema = z.object({
  key: z.string().min(1).max(64),
  parentKey: z.string().min(1).max(64).nullable(),
  author: person,
  body: z.string().min(1).max(5000),
  increment: z.number().int().min(0).max(INT4_MAX).nullable(),
  createdAt: iso,
  editedAt: iso.nullable(),
});

const revisionSchema = z.object({
  number: z.number().int().min(1).max(INT4_MAX),
  author: person,
  message: z.string().max(2000),
  file: z.record(z.string(), z.unknown()),
  createdAt: iso,
  review: z.object({ state, by: person, at: iso.nullable() }),
  reviewEvents: z.array(
    z.object({ from: state, to: state, actor: person, note: z.string().max(2000), at: iso }),
  ),
  comments: z.array(commentSchema),
});

const scenarioSchema = z.object({
  name: z.string().trim().min(1).max(200),
  materialLabel: z.string().max(200),
  tags: z.array(z.string().min(1).max(40)).max(20),
  createdBy: person,
  createdAt: iso,
  updatedAt: iso,
  revisions: z.array(revisionSchema).min(1),
});

// One version of a library set (issue 13): what the set held from createdAt until the next one.
const parameterSetVersionSchema = z.object({
  version: z.number().int().min(1).max(INT4_MAX),
  values: z.record(z.string(), z.unknown()),
  provenance: provenanceSchema,
  createdBy: person,
  createdAt: iso,
});

const parameterSetSchema = z.object({
  name: z.string().trim().min(1).max(200),
  // Checked against the scenario module's schema by the import service.
  values: z.record(z.string(), z.unknown()),
  provenance: provenanceSchema,
  createdBy: person,
  updatedBy: person,
  createdAt: iso,
  updatedAt: iso,
  /** Oldest first; files written before versions existed have none (the set is version 1). */
  versions: z.array(parameterSetVersionSchema).max(10_000).optional(),
});

export const teamExportSchema = z.object({
  format: z.literal(
    TEAM_EXPORT_FORMAT,
    `This is not a Craquelure team export (${TEAM_EXPORT_FORMAT}).`,
  ),
  exportedAt: iso,
  team: z.object({ name: z.string(), slug: z.string() }),
  parameterSets: z.array(parameterSetSchema),
  scenarios: z.array(scenarioSchema),
  // Absent from files written before records and fits travelled: those import as before.
  testRecords: z.array(exportTestRecordSchema).default([]),
  fits: z.array(exportFitSchema).default([]),
});

export type TeamExport = z.infer<typeof teamExportSchema>;
export type ExportPerson = z.infer<typeof person>;
export type ExportScenario = TeamExport["scenarios"][number];
export type ExportRevision = ExportScenario["revisions"][number];
export type { ExportFit, ExportTestRecord } from "./team-export-records";

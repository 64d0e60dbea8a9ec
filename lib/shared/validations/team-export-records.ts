import { z } from "zod";

import { couponOrientationSchema } from "@/lib/calibration/micromechanics/coupon-orientation";
import { TEST_TYPES } from "@/lib/csv/record-schema";
import { layoutSchema } from "@/lib/csv/file-layout";
import { geometrySchema } from "@/lib/csv/record-mapping";
import { FORCE_UNITS, LENGTH_UNITS, STRAIN_UNITS, STRESS_UNITS } from "@/lib/csv/units";

// Test records and fits in a team export (issue 13 item 8). A record's `key` is the exporting
// team's id for it: fits and the scenario files' overlays name records by that key inside the
// file, and the import gives every record a new id and rewrites those references. A fit names
// its parameter set by name (set names are unique in a team and in the file).

const iso = z.iso.datetime({ offset: true, error: "must be an ISO date-time" });
const person = z.object({ email: z.string().max(320), name: z.string().max(200) }).nullable();
const key = z.string().min(1).max(64);
const numbers = z.array(z.number());
const column = z.number().int().min(0).max(63);

const pointsSchema = z.object({
  strain: numbers,
  stress: numbers,
  time: numbers.optional(),
  transverseStrain: numbers.optional(),
  shearStrain: numbers.optional(),
  shearStress: numbers.optional(),
});

const mappingSchema = z.object({
  strain: column,
  stress: column,
  time: column.optional(),
  transverseStrain: column.optional(),
  shearStrain: column.optional(),
  shearStress: column.optional(),
  strainUnit: z.enum(STRAIN_UNITS),
  stressUnit: z.enum(STRESS_UNITS),
  // A machine file's record says how its stress and strain were made (raw columns, geometry,
  // layout); records of plain curve files have none of these.
  force: column.optional(),
  extension: column.optional(),
  conversion: z
    .object({
      forceColumn: z.string().max(200).optional(),
      forceUnit: z.enum(FORCE_UNITS).optional(),
      extensionColumn: z.string().max(200).optional(),
      extensionUnit: z.enum(LENGTH_UNITS).optional(),
    })
    .optional(),
  geometry: geometrySchema.optional(),
  layout: layoutSchema.required().optional(),
});

export const exportTestRecordSchema = z.object({
  key,
  name: z.string().trim().min(1).max(200),
  testType: z.enum(TEST_TYPES),
  loading: z.enum(["monotonic", "cyclic"]),
  specimenId: z.string().max(100),
  orientation: z.number().min(-180).max(180),
  strainRate: z.number().nullable(),
  temperature: z.number().nullable(),
  laboratory: z.string().max(200).nullable(),
  notes: z.string().max(5000).nullable(),
  couponOrientation: couponOrientationSchema.nullable(),
  mapping: mappingSchema,
  headers: z.array(z.string()),
  warnings: z.array(z.string()),
  points: pointsSchema,
  /** The file as uploaded; sha256 (hex, of its UTF-8 bytes) is checked against the text. */
  file: z.object({
    name: z.string().min(1).max(300),
    size: z.number().int().min(0),
    sha256: z.string().regex(/^[0-9a-f]{64}$/, "must be 64 hexadecimal digits"),
    text: z.string(),
  }),
  createdBy: person,
  createdAt: iso,
});

export const exportFitSchema = z.object({
  /** Keys of the records the fit used; a key not in the file is a record deleted before export. */
  recordKeys: z.array(key),
  method: z.enum(["identify", "refine"]),
  options: z.record(z.string(), z.unknown()),
  // Checked against the scenario module's parameter-set schema by the import.
  params: z.record(z.string(), z.unknown()),
  reports: z.array(z.looseObject({ id: z.string() })),
  residuals: z.array(z.looseObject({ id: z.string() })),
  warnings: z.array(z.string()),
  uncertainty: z.record(z.string(), z.unknown()).nullable(),
  /** The name of the parameter set the fit was saved as, null when none (or deleted). */
  parameterSet: z.string().nullable(),
  createdBy: person,
  createdAt: iso,
});

export type ExportTestRecord = z.infer<typeof exportTestRecordSchema>;
export type ExportFit = z.infer<typeof exportFitSchema>;

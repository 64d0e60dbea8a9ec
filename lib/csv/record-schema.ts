/**
 * The mapping step's answer and a test record's metadata (issue 6), validated at every boundary:
 * the upload form, the server action and the worker use this one schema.
 */
import { z } from "zod";
import { couponOrientationSchema } from "@/lib/calibration/micromechanics/coupon-orientation";

import { STRAIN_UNITS, STRESS_UNITS } from "./units";

export const TEST_TYPES = [
  "tension-1",
  "tension-2",
  "compression-1",
  "shear-12",
  "biaxial",
  "transverse-after-damage-1",
] as const;
export type TestType = (typeof TEST_TYPES)[number];

const columnIndex = z.number().int().min(0).max(63);

export const columnMappingSchema = z
  .strictObject({
    strain: columnIndex,
    stress: columnIndex,
    time: columnIndex.optional(),
    transverseStrain: columnIndex.optional(),
    shearStrain: columnIndex.optional(),
    shearStress: columnIndex.optional(),
    strainUnit: z.enum(["auto", ...STRAIN_UNITS]).default("auto"),
    stressUnit: z.enum(["auto", ...STRESS_UNITS]).default("auto"),
  })
  .refine(
    (m) => {
      const used = [m.strain, m.stress, m.time, m.transverseStrain, m.shearStrain, m.shearStress];
      const set = used.filter((i) => i !== undefined);
      return new Set(set).size === set.length;
    },
    { message: "each column can be mapped to one quantity only" },
  );
export type ColumnMappingInput = z.input<typeof columnMappingSchema>;
export type ColumnMappingChoice = z.output<typeof columnMappingSchema>;

const text = (max: number) => z.string().trim().max(max);

export const testRecordMetaSchema = z.strictObject({
  testType: z.enum(TEST_TYPES),
  loading: z.enum(["monotonic", "cyclic"]),
  specimenId: text(100).min(1, "give the specimen an id"),
  orientation: z.number().min(-180).max(180).default(0), // degrees from the damage axis 1
  strainRate: z.number().positive().optional(), // 1/s
  temperature: z.number().min(-273.15).max(1000).optional(), // °C
  laboratory: text(200).optional(),
  notes: text(5000).optional(),
  couponOrientation: couponOrientationSchema.optional(), // cut angle φ and layer tensors (A.5)
});
export type TestRecordMeta = z.infer<typeof testRecordMetaSchema>;

/**
 * The upload's full answer for one file: the layout, which column is which quantity (stress and
 * strain, or force and extension with the specimen's geometry) and the units. Stored in the
 * record's `mapping` beside the columns the reader derived, so the record says how its stress and
 * strain were made.
 */
import { z } from "zod";

import { layoutSchema } from "./file-layout";
import { FORCE_UNITS, LENGTH_UNITS, STRAIN_UNITS, STRESS_UNITS } from "./units";

const columnIndex = z.number().int().min(0).max(63);

/** A length of the specimen in mm, as typed; the labels name the field on screen. */
export const GEOMETRY_LABELS = {
  widthMm: "width",
  thicknessMm: "thickness",
  gaugeLengthMm: "gauge length",
} as const;
const lengthMm = (label: string) =>
  z
    .number({ error: `Give the specimen's ${label} in mm as a number.` })
    .positive(`The specimen's ${label} must be more than 0 mm.`)
    .max(10_000, `The specimen's ${label} must be at most 10,000 mm.`)
    .optional();

export const geometrySchema = z.strictObject({
  widthMm: lengthMm(GEOMETRY_LABELS.widthMm),
  thicknessMm: lengthMm(GEOMETRY_LABELS.thicknessMm),
  gaugeLengthMm: lengthMm(GEOMETRY_LABELS.gaugeLengthMm),
});
export type Geometry = z.infer<typeof geometrySchema>;

export const recordMappingSchema = z
  .strictObject({
    strain: columnIndex.optional(),
    stress: columnIndex.optional(),
    force: columnIndex.optional(),
    extension: columnIndex.optional(),
    time: columnIndex.optional(),
    transverseStrain: columnIndex.optional(),
    shearStrain: columnIndex.optional(),
    shearStress: columnIndex.optional(),
    strainUnit: z.enum(["auto", ...STRAIN_UNITS]).default("auto"),
    stressUnit: z.enum(["auto", ...STRESS_UNITS]).default("auto"),
    forceUnit: z.enum(["auto", ...FORCE_UNITS]).default("auto"),
    extensionUnit: z.enum(["auto", ...LENGTH_UNITS]).default("auto"),
    geometry: geometrySchema.optional(),
    layout: layoutSchema.optional(),
  })
  .refine(
    (m) => {
      const used = [
        m.strain,
        m.stress,
        m.force,
        m.extension,
        m.time,
        m.transverseStrain,
        m.shearStrain,
        m.shearStress,
      ].filter((i) => i !== undefined);
      return new Set(used).size === used.length;
    },
    { message: "each column can be mapped to one quantity only" },
  );
export type RecordMappingInput = z.input<typeof recordMappingSchema>;
export type RecordMapping = z.output<typeof recordMappingSchema>;

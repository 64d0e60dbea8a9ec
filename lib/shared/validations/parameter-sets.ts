import { z } from "zod";

import { CLOSURES } from "@/lib/calibration/micromechanics/closure";
import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";

const nameSchema = z
  .string()
  .trim()
  .min(1, "Give the parameter set a name.")
  .max(200, "Keep the name under 200 characters.");

// An orientation state a set came from (spec A.5): the layer tensors, the closure when the
// stiffness was averaged with one, and the cut angle φ with the record's name when a coupon's.
export const orientationProvenanceSchema = z.strictObject({
  record: z.string().max(200).optional(),
  cutAngle: z.number().min(-180).max(180).optional(),
  closure: z.enum(CLOSURES).optional(),
  layers: z
    .array(z.strictObject({ fraction: z.number(), a11: z.number(), a12: z.number() }))
    .min(1)
    .max(50),
  /** the constituents the aligned ply came from (Halpin–Tsai), when the state was computed here */
  constituents: z
    .strictObject({
      Ef: z.number(),
      nuf: z.number(),
      Em: z.number(),
      num: z.number(),
      Vf: z.number(),
      aspect: z.number(),
    })
    .optional(),
});

export type OrientationProvenance = z.output<typeof orientationProvenanceSchema>;

export const provenanceSchema = z.strictObject({
  kind: z.enum(["typed", "fitted", "constituents"], "Provenance is typed, fitted or constituents."),
  records: z.array(z.string().max(200)).max(200).optional(),
  method: z.string().max(500).optional(),
  residuals: z.record(z.string().max(100), z.number()).optional(),
  note: z.string().max(5000).optional(),
  orientations: z.array(orientationProvenanceSchema).max(200).optional(),
});

export const createParameterSetSchema = z.object({
  name: nameSchema,
  values: parameterSetSchema,
  provenance: provenanceSchema.default({ kind: "typed" }),
});
export type CreateParameterSetInput = z.input<typeof createParameterSetSchema>;

export const updateParameterSetSchema = z
  .object({
    name: nameSchema.optional(),
    values: parameterSetSchema.optional(),
    provenance: provenanceSchema.optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), "Nothing to change.");
export type UpdateParameterSetInput = z.input<typeof updateParameterSetSchema>;

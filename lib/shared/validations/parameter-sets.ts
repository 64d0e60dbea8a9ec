import { z } from "zod";

import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";

const nameSchema = z
  .string()
  .trim()
  .min(1, "Give the parameter set a name.")
  .max(200, "Keep the name under 200 characters.");

export const provenanceSchema = z.strictObject({
  kind: z.enum(["typed", "fitted", "constituents"], "Provenance is typed, fitted or constituents."),
  records: z.array(z.string().max(200)).max(200).optional(),
  method: z.string().max(500).optional(),
  residuals: z.record(z.string().max(100), z.number()).optional(),
  note: z.string().max(5000).optional(),
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

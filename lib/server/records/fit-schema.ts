import "server-only";

/** Bodies of the identification and save-fit requests. */
import { z } from "zod";

import { FITTABLE } from "@/lib/calibration/refine-params";
import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";
import { orientationProvenanceSchema } from "@/lib/shared/validations/parameter-sets";

const recordIds = z
  .array(z.string().uuid("Pick test records of this team."), "Pick at least one test record.")
  .min(1, "Pick at least one test record.")
  .max(20, "Pick at most 20 test records.");

export const identifyRequestSchema = z.strictObject({
  recordIds,
  law: z.enum(["sqrtY", "linY"]).default("sqrtY"),
  modulus: z.enum(["unloading", "chord"]).default("unloading"),
  /** Values no record informs (elastic estimates from constituents, or a team set). */
  base: parameterSetSchema.optional(),
});
export type IdentifyRequest = z.input<typeof identifyRequestSchema>;

const setName = z
  .string()
  .trim()
  .min(1, "Give the new parameter set a name.")
  .max(200, "Keep the name under 200 characters.");

export const saveFitSchema = z.discriminatedUnion("method", [
  identifyRequestSchema.extend({
    method: z.literal("identify"),
    name: setName,
    /** The orientation state the starting values came from ("Use as parameter set"), if any. */
    baseOrientation: orientationProvenanceSchema.optional(),
  }),
  z.strictObject({
    method: z.literal("refine"),
    name: setName,
    recordIds,
    /** The refined values from the browser; the server replays them to get the residuals. */
    params: parameterSetSchema,
    free: z.array(z.enum(FITTABLE)).max(FITTABLE.length).default([]),
    bounds: z.record(z.enum(FITTABLE), z.tuple([z.number(), z.number()])).optional(),
  }),
]);
export type SaveFitRequest = z.input<typeof saveFitSchema>;

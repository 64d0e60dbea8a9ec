import "server-only";

/**
 * A parameter study request: one scenario file's path run for many parameter sets. Either the
 * file's own sets (one path × many sets), or a grid over one or two numeric parameters of one
 * base set. The sets that come out are checked by the scenario file schema like any others.
 */
import { z } from "zod";

import { PARAMETER_FIELDS } from "@/lib/scenario/parameter-fields";

export const NUMERIC_PARAMETERS = PARAMETER_FIELDS.filter((f) => f.kind === "number").map(
  (f) => f.symbol,
) as [string, ...string[]];

/** Sets per study, and increments summed over all of them: a study is a batch, not a cluster. */
export const MAX_STUDY_SETS = 1000;
export const MAX_STUDY_INCREMENTS = 20_000_000;

const axisSchema = z
  .strictObject({
    parameter: z.enum(NUMERIC_PARAMETERS).describe("A numeric parameter of the law, e.g. Y0_1"),
    values: z.array(z.number()).min(1).max(MAX_STUDY_SETS).optional().describe("Explicit values"),
    from: z.number().optional(),
    to: z.number().optional(),
    count: z.int().min(1).max(MAX_STUDY_SETS).optional().describe("Evenly spaced from → to"),
  })
  .refine(
    (a) =>
      a.values !== undefined ||
      (a.from !== undefined && a.to !== undefined && a.count !== undefined),
    {
      error: "give either values, or from, to and count",
    },
  );
export type StudyAxis = z.infer<typeof axisSchema>;

export const studyRequestSchema = z.strictObject({
  name: z.string().trim().max(200).default(""),
  scenario: z
    .record(z.string(), z.unknown())
    .describe("A scenario file (craquelure.scenario/1): its path, and its sets or the grid's base"),
  grid: z
    .strictObject({
      base: z.string().min(1).max(64).optional().describe("Id of the base set; default: the first"),
      axes: z.array(axisSchema).min(1).max(2),
    })
    .optional()
    .describe("Without a grid, the study runs every set of the file"),
});
export type StudyRequest = z.infer<typeof studyRequestSchema>;

export function axisValues(axis: StudyAxis): number[] {
  if (axis.values) return axis.values;
  const { from = 0, to = 0, count = 1 } = axis;
  if (count === 1) return [from];
  return Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));
}

/**
 * zod schema of a loading path (scenario-file.md "A leg", spec C.1): legs with a control kind
 * and a target per load-frame component (11, 22, 12), plus the generators the legs came from.
 * The legs are what runs; generators are kept so the editor can show the shorter form again.
 */
import { z } from "zod";
import type { Leg } from "@/lib/mechanics/types";
import { generatorMismatch, placedGeneratorSchema } from "./cycle-generator";
import { choice, finiteNumber, integerIn, objectError } from "./schema-helpers";

/** Hard cap on the increments of one path (scenario-file.md, validation). */
export const MAX_TOTAL_INCREMENTS = 1_000_000;

const controlKind = choice(["strain", "stress"]);

const legSchema = z.strictObject(
  {
    control: z.tuple([controlKind, controlKind, controlKind], {
      error: 'must be a list of 3 entries, each "strain" or "stress", for (11, 22, 12)',
    }),
    target: z.tuple([finiteNumber(), finiteNumber(), finiteNumber()], {
      error: "must be a list of 3 numbers for (11, 22, 12)",
    }),
    increments: integerIn(1, Infinity),
  },
  objectError("an object"),
) satisfies z.ZodType<Leg>;

export const pathSchema = z
  .strictObject(
    {
      legs: z
        .array(legSchema, { error: "required (a list of legs)" })
        .min(1, { error: "must contain at least one leg (the path is empty)" }),
      generators: z.array(placedGeneratorSchema, { error: "must be a list" }).default([]),
    },
    objectError("an object"),
  )
  .superRefine((path, ctx) => {
    const total = path.legs.reduce((sum, leg) => sum + leg.increments, 0);
    if (total > MAX_TOTAL_INCREMENTS) {
      ctx.addIssue({
        code: "custom",
        path: ["legs"],
        message: `total increments ${total} exceed the limit of ${MAX_TOTAL_INCREMENTS}`,
        input: path.legs,
      });
    }
    path.generators.forEach((generator, index) => {
      const problem = generatorMismatch(generator, path.legs);
      if (problem) {
        ctx.addIssue({
          code: "custom",
          path: ["generators", index],
          message: problem,
          input: generator,
        });
      }
    });
  });

export type Path = z.output<typeof pathSchema>;

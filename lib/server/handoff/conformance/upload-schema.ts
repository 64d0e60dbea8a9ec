import "server-only";

import { z } from "zod";

import { DEFAULT_TOLERANCE } from "./types";

/** Columns a history file maps to (0-based column indices); found by header name when absent. */
export const HISTORY_CHANNELS = [
  "increment",
  "eps11",
  "eps22",
  "gam12",
  "sig11",
  "sig22",
  "sig12",
  "d1",
  "d2",
] as const;
export type HistoryChannel = (typeof HISTORY_CHANNELS)[number];
export const REQUIRED_CHANNELS: HistoryChannel[] = [
  "eps11",
  "eps22",
  "gam12",
  "sig11",
  "sig22",
  "sig12",
];

const column = z.int().min(0).max(63);

const historyMappingSchema = z.strictObject(
  Object.fromEntries(HISTORY_CHANNELS.map((c) => [c, column.optional()])) as Record<
    HistoryChannel,
    z.ZodOptional<typeof column>
  >,
);
export type HistoryMapping = z.infer<typeof historyMappingSchema>;

export const conformanceUploadSchema = z.strictObject({
  set: z.string().min(1).max(64).optional().describe("Parameter set id; default: the first"),
  fileName: z.string().trim().min(1).max(255),
  text: z.string().describe("The history as CSV text: strains in mm/mm, stresses in MPa"),
  mapping: historyMappingSchema.optional(),
  tolerance: z
    .strictObject({
      stressFraction: z
        .number()
        .gt(0)
        .max(1)
        .default(DEFAULT_TOLERANCE.stressFraction)
        .describe("Fraction of the peak stress (0.01 = 1 %)"),
      damage: z.number().gt(0).max(1).default(DEFAULT_TOLERANCE.damage),
    })
    .default(DEFAULT_TOLERANCE),
});
export type ConformanceUpload = z.infer<typeof conformanceUploadSchema>;

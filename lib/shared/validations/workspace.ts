import { z } from "zod";

import { reviewState } from "@/db/schema/scenarios";

import { INT4_MAX } from "./int4";

// Inputs of the team workspace API. The same schemas serve forms and route handlers; the
// scenario file and parameter values are checked by the scenario module's own schemas.

const shortText = (max: number, what: string) =>
  z.string().trim().max(max, `Keep the ${what} under ${max} characters.`);

const scenarioNameSchema = shortText(200, "name").min(1, "Give the scenario a name.");
const materialLabelSchema = shortText(200, "material label");
const messageSchema = shortText(2000, "message");

// Tags are compared as typed after trimming; duplicates collapse.
const tagsSchema = z
  .array(shortText(40, "tag").min(1, "Tags cannot be empty."), "Tags must be a list of words.")
  .max(20, "Use at most 20 tags.")
  .transform((tags) => [...new Set(tags)]);

export const REVIEW_STATES = reviewState.enumValues;
const reviewStateSchema = z.enum(REVIEW_STATES, "Unknown review state.");

export const scenarioListQuerySchema = z.object({
  sort: z
    .enum(["name", "updated", "review"], "Sort by name, updated or review.")
    .default("updated"),
  dir: z.enum(["asc", "desc"], "Direction is asc or desc.").optional(),
  tag: shortText(40, "tag").min(1).optional(),
  review: reviewStateSchema.optional(),
  author: z.uuid("Unknown author.").optional(),
  q: shortText(200, "search").min(1).optional(),
  page: z.coerce.number("Page must be a number.").int().min(1).max(1_000_000).default(1),
  pageSize: z.coerce.number("Page size must be a number.").int().min(1).max(100).default(25),
});
export type ScenarioListQuery = z.output<typeof scenarioListQuerySchema>;

export const createScenarioSchema = z.object({
  name: scenarioNameSchema,
  materialLabel: materialLabelSchema.default(""),
  tags: tagsSchema.default([]),
  message: messageSchema.default(""),
  file: z.unknown(),
});
export type CreateScenarioInput = z.input<typeof createScenarioSchema>;

export const updateScenarioSchema = z
  .object({
    name: scenarioNameSchema.optional(),
    materialLabel: materialLabelSchema.optional(),
    tags: tagsSchema.optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), "Nothing to change.");
export type UpdateScenarioInput = z.input<typeof updateScenarioSchema>;

export const saveRevisionSchema = z.object({
  baseRevision: z
    .number("Name the revision you started from (baseRevision).")
    .int()
    .min(1, "Name the revision you started from (baseRevision).")
    .max(INT4_MAX, "No revision has that number (baseRevision)."),
  message: messageSchema.default(""),
  file: z.unknown(),
});
export type SaveRevisionInput = z.input<typeof saveRevisionSchema>;

export const commentSchema = z.object({
  body: shortText(5000, "comment").min(1, "Write something first."),
  parentId: z.uuid("Unknown comment to reply to.").optional(),
  increment: z
    .number("The increment must be a number.")
    .int()
    .min(0)
    .max(INT4_MAX, "No increment has that number.")
    .optional(),
});
export type CommentInput = z.input<typeof commentSchema>;

export const editCommentSchema = z.object({
  body: shortText(5000, "comment").min(1, "Write something first."),
});

const reviewNoteSchema = shortText(2000, "note").default("");

// A request names whom it is asked of: at least one of the team's reviewers or owners (the
// service checks membership and role; the ids here are only checked to be ids).
export const reviewActionSchema = z.discriminatedUnion(
  "action",
  [
    z.object({
      action: z.literal("request"),
      note: reviewNoteSchema,
      reviewers: z
        .array(z.uuid("Choose reviewers from the team's list."), "Choose at least one reviewer.")
        .min(1, "Choose at least one reviewer.")
        .max(100, "Choose at most 100 reviewers."),
    }),
    z.object({ action: z.enum(["approve", "request-changes"]), note: reviewNoteSchema }),
  ],
  "Unknown review action.",
);
export type ReviewActionInput = z.input<typeof reviewActionSchema>;

export const createShareLinkSchema = z.object({
  expiresInDays: z.number("Days must be a number.").int().min(1).max(90).default(14),
});
export type CreateShareLinkInput = z.input<typeof createShareLinkSchema>;

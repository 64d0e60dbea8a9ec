import { index, integer, jsonb, pgTable, text, timestamp, unique, uuid } from "drizzle-orm/pg-core";

import type { Leg, RunStatus } from "@/lib/mechanics/types";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

import { teams } from "./teams";
import { users } from "./users";

export type StudyState = "queued" | "running" | "done" | "failed";
export type StudyItemState = "queued" | "done" | "failed";

// A parameter study: one path run for many parameter sets. Each set is one queue job; the
// study row only counts what its items report.
export const parameterStudies = pgTable(
  "parameter_studies",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    teamId: uuid("team_id")
      .notNull()
      .references(() => teams.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    legs: jsonb("legs").$type<Leg[]>().notNull(),
    /** How the sets were made: a list or a grid (kept for the record). */
    design: jsonb("design").$type<Record<string, unknown>>().notNull(),
    total: integer("total").notNull(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("parameter_studies_team_idx").on(t.teamId, t.createdAt)],
);

export const studyItems = pgTable(
  "study_items",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    studyId: uuid("study_id")
      .notNull()
      .references(() => parameterStudies.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    set: jsonb("set").$type<ParameterSet>().notNull(),
    state: text("state").$type<StudyItemState>().notNull().default("queued"),
    /** The contract's CSV of this set's run (scenario-file.md). */
    csv: text("csv"),
    status: jsonb("status").$type<RunStatus>(),
    error: text("error"),
    attempts: integer("attempts").notNull().default(0),
    finishedAt: timestamp("finished_at", { withTimezone: true }),
  },
  (t) => [unique("study_items_position_uq").on(t.studyId, t.position)],
);

export type ParameterStudyRow = typeof parameterStudies.$inferSelect;
export type StudyItemRow = typeof studyItems.$inferSelect;

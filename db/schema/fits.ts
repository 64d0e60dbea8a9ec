import { index, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

import type { RecordReport } from "@/lib/calibration/identify";
import type { RecordResidual } from "@/lib/calibration/refine";
import type { FitUncertainty } from "@/lib/calibration/uncertainty";
import type { MaterialParams } from "@/lib/mechanics/types";

import { parameterSets } from "./parameter-sets";
import { teams } from "./teams";
import { users } from "./users";

// One identification or refinement run and what came out of it. The records are referenced by
// id (a deleted record leaves its id here); the resulting parameter set may be renamed or deleted
// later without losing the fit.
export const fits = pgTable(
  "fits",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    teamId: uuid("team_id")
      .notNull()
      .references(() => teams.id, { onDelete: "cascade" }),
    recordIds: jsonb("record_ids").$type<string[]>().notNull(),
    method: text("method").$type<"identify" | "refine">().notNull(),
    options: jsonb("options").$type<Record<string, unknown>>().notNull().default({}),
    params: jsonb("params").$type<MaterialParams>().notNull(),
    reports: jsonb("reports").$type<RecordReport[]>().notNull().default([]),
    residuals: jsonb("residuals").$type<RecordResidual[]>().notNull().default([]),
    warnings: jsonb("warnings").$type<string[]>().notNull().default([]),
    /** standard errors, 95 % intervals, correlations of a refinement's free values; null otherwise */
    uncertainty: jsonb("uncertainty").$type<FitUncertainty>(),
    parameterSetId: uuid("parameter_set_id").references(() => parameterSets.id, {
      onDelete: "set null",
    }),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("fits_team_created_idx").on(t.teamId, t.createdAt)],
);

export type FitRow = typeof fits.$inferSelect;

import { sql } from "drizzle-orm";
import {
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

import type { ParameterSetInput } from "@/lib/scenario/parameter-set-schema";

import { teams } from "./teams";
import { users } from "./users";

/** Where a parameter set came from: typed in, fitted from test records, or from constituents. */
export interface ParameterSetProvenance {
  kind: "typed" | "fitted" | "constituents";
  /** Ids or names of the test records a fit used. */
  records?: string[];
  method?: string;
  residuals?: Record<string, number>;
  note?: string;
  /** The orientation states behind the set (spec A.5): coupons' layer tensors and cut angles. */
  orientations?: {
    record?: string;
    cutAngle?: number;
    closure?: "exact" | "hybrid" | "linear" | "quadratic";
    layers: { fraction: number; a11: number; a12: number }[];
  }[];
}

// A team's library of parameter sets. Values are validated by the scenario module's
// parameterSetSchema before they get here; authors are kept as "set null" so work outlives people.
export const parameterSets = pgTable(
  "parameter_sets",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    teamId: uuid("team_id")
      .notNull()
      .references(() => teams.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    values: jsonb("values").$type<ParameterSetInput>().notNull(),
    provenance: jsonb("provenance")
      .$type<ParameterSetProvenance>()
      .notNull()
      .default(sql`'{"kind":"typed"}'::jsonb`),
    /** The number of the latest row in parameter_set_versions; values above are that version's. */
    version: integer("version").notNull().default(1),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    updatedBy: uuid("updated_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    // One name per team: the library is looked up by name in forms and in imports.
    uniqueIndex("parameter_sets_team_name_idx").on(t.teamId, t.name),
    index("parameter_sets_team_updated_idx").on(t.teamId, t.updatedAt),
  ],
);

export type ParameterSetRow = typeof parameterSets.$inferSelect;

// Every edit of a set's values keeps what the set was: version 1 is the set as created, each
// values edit adds n+1. Revisions copy values into their file, so this is the library's memory of
// which numbers a name stood for, and the report can name a superseded version.
export const parameterSetVersions = pgTable(
  "parameter_set_versions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    setId: uuid("set_id")
      .notNull()
      .references(() => parameterSets.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    values: jsonb("values").$type<ParameterSetInput>().notNull(),
    provenance: jsonb("provenance").$type<ParameterSetProvenance>().notNull(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("parameter_set_versions_set_version_idx").on(t.setId, t.version)],
);

export type ParameterSetVersionRow = typeof parameterSetVersions.$inferSelect;

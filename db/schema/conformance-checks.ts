import {
  boolean,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uuid,
} from "drizzle-orm/pg-core";

import type { ConformanceResult } from "@/lib/server/handoff/conformance/types";

import { scenarioRevisions } from "./scenarios";
import { teams } from "./teams";
import { users } from "./users";

// One conformance check of a revision: the uploaded single-point history (kept as sent), the
// tolerance, and the comparison per quantity. Recorded on the revision, never changed after.
export const conformanceChecks = pgTable(
  "conformance_checks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    teamId: uuid("team_id")
      .notNull()
      .references(() => teams.id, { onDelete: "cascade" }),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => scenarioRevisions.id, { onDelete: "cascade" }),
    setId: text("set_id").notNull(),
    fileName: text("file_name").notNull(),
    fileText: text("file_text").notNull(),
    passed: boolean("passed").notNull(),
    firstFailIncrement: integer("first_fail_step"),
    result: jsonb("result").$type<ConformanceResult>().notNull(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("conformance_checks_revision_idx").on(t.revisionId, t.createdAt)],
);

export type ConformanceCheckRow = typeof conformanceChecks.$inferSelect;

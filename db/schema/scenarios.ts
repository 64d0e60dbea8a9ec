import { sql } from "drizzle-orm";
import {
  bigserial,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  unique,
  uuid,
} from "drizzle-orm/pg-core";

import { teams } from "./teams";
import { users } from "./users";

export const reviewState = pgEnum("review_state", [
  "draft",
  "in_review",
  "approved",
  "changes_requested",
]);
export type ReviewState = (typeof reviewState.enumValues)[number];

export const scenarios = pgTable(
  "scenarios",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    teamId: uuid("team_id")
      .notNull()
      .references(() => teams.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    materialLabel: text("material_label").notNull().default(""),
    tags: text("tags").array().notNull().default([]),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    // The number of the newest revision; the save transaction locks this row and bumps it.
    latestRevision: integer("latest_revision").notNull().default(0),
    // Copy of the newest revision's review state, kept in step by the save and review
    // transactions, so the list can filter and sort by it without reading 100k revisions.
    latestReviewState: reviewState("latest_review_state").notNull().default("draft"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("scenarios_team_updated_idx").on(t.teamId, t.updatedAt),
    // Names sort the way people read them (alpha, Bravo, charlie), not by byte value.
    index("scenarios_team_lower_name_idx").on(t.teamId, sql`lower(${t.name})`),
    index("scenarios_tags_idx").using("gin", t.tags),
    index("scenarios_team_review_idx").on(t.teamId, t.latestReviewState, t.updatedAt),
  ],
);

// Immutable content: number, author, message and file never change after insert. Only the
// review columns move (draft → in review → approved | changes requested), each move also
// written to review_events.
export const scenarioRevisions = pgTable(
  "scenario_revisions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    scenarioId: uuid("scenario_id")
      .notNull()
      .references(() => scenarios.id, { onDelete: "cascade" }),
    number: integer("number").notNull(),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    message: text("message").notNull().default(""),
    file: jsonb("file").$type<Record<string, unknown>>().notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    reviewState: reviewState("review_state").notNull().default("draft"),
    reviewBy: uuid("review_by").references(() => users.id, { onDelete: "set null" }),
    reviewAt: timestamp("review_at", { withTimezone: true }),
    // Set only by a team import: the reviewer's name as the file gave it. An imported sign-off
    // is text, never a user of this installation (the file could name anyone).
    importedReviewBy: text("imported_review_by"),
  },
  // The arbiter of concurrent saves: two saves can never both become number N.
  (t) => [unique("scenario_revisions_number_uq").on(t.scenarioId, t.number)],
);

export const reviewEvents = pgTable(
  "review_events",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => scenarioRevisions.id, { onDelete: "cascade" }),
    fromState: reviewState("from_state").notNull(),
    toState: reviewState("to_state").notNull(),
    actorId: uuid("actor_id").references(() => users.id, { onDelete: "set null" }),
    note: text("note").notNull().default(""),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    // Imported history: the actor's name from the file, as text (actor_id stays empty).
    importedActor: text("imported_actor"),
    // On a request (to_state in_review): the users the requester chose to judge it, kept on
    // the event so the history says whom each request was asked of. Empty on verdicts, on
    // imported history and on requests made before reviewers were chosen.
    chosenReviewers: uuid("chosen_reviewers").array().notNull().default([]),
  },
  (t) => [index("review_events_revision_idx").on(t.revisionId, t.at)],
);

export type ScenarioRow = typeof scenarios.$inferSelect;
export type RevisionRow = typeof scenarioRevisions.$inferSelect;
export type ReviewEventRow = typeof reviewEvents.$inferSelect;

import { bigserial, index, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

import { teams } from "./teams";
import { users } from "./users";

// The trail outlives what it describes: deleting a user or team nulls the link, the row stays
// (detail keeps the slug / e-mail for reading it later).
export const auditEvents = pgTable(
  "audit_events",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    actorId: uuid("actor_id").references(() => users.id, { onDelete: "set null" }),
    teamId: uuid("team_id").references(() => teams.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    target: text("target"),
    detail: jsonb("detail").$type<Record<string, unknown>>().notNull().default({}),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("audit_events_team_idx").on(t.teamId, t.at)],
);

export type AuditEvent = typeof auditEvents.$inferSelect;

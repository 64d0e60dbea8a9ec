import { index, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

import { teamRole, teams } from "./teams";
import { users } from "./users";

// A personal API token: bound to one team with a role no higher than its owner's role there.
// Only the SHA-256 of the secret is kept; `prefix` (the first characters) lets people tell
// their tokens apart. The role is re-checked against the current membership at every use.
export const apiTokens = pgTable(
  "api_tokens",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    teamId: uuid("team_id")
      .notNull()
      .references(() => teams.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    role: teamRole("role").notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    prefix: text("prefix").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    lastUsedAt: timestamp("last_used_at", { withTimezone: true }),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
  },
  (t) => [index("api_tokens_user_idx").on(t.userId, t.createdAt)],
);

export type ApiTokenRow = typeof apiTokens.$inferSelect;

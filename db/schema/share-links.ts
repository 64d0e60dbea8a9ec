import { index, integer, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

import { scenarioRevisions } from "./scenarios";
import { teams } from "./teams";
import { users } from "./users";

// A link hands one revision to anyone holding it. Only the SHA-256 of its 128-bit token is
// kept, so the table alone cannot be turned into working links.
export const shareLinks = pgTable(
  "share_links",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    teamId: uuid("team_id")
      .notNull()
      .references(() => teams.id, { onDelete: "cascade" }),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => scenarioRevisions.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull().unique(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    revokedBy: uuid("revoked_by").references(() => users.id, { onDelete: "set null" }),
    viewCount: integer("view_count").notNull().default(0),
    lastViewedAt: timestamp("last_viewed_at", { withTimezone: true }),
  },
  (t) => [
    index("share_links_team_idx").on(t.teamId, t.createdAt),
    index("share_links_revision_idx").on(t.revisionId),
  ],
);

export type ShareLinkRow = typeof shareLinks.$inferSelect;

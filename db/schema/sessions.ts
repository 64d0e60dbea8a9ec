import { index, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

import { users } from "./users";

// Shape required by lucia's Drizzle adapter: id, user_id, expires_at. The id is the SHA-256 of
// the secret the cookie carries (lib/server/accounts/auth/session-token.ts), so the table alone
// cannot be turned into working cookies. signed_in_at bounds a session's whole life.
export const sessions = pgTable(
  "sessions",
  {
    id: text("id").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
    signedInAt: timestamp("signed_in_at", { withTimezone: true, mode: "date" })
      .notNull()
      .defaultNow(),
  },
  (t) => [index("sessions_user_idx").on(t.userId), index("sessions_expires_idx").on(t.expiresAt)],
);

export type Session = typeof sessions.$inferSelect;

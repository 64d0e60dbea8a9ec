import { sql } from "drizzle-orm";
import { index, integer, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

// Mail the SMTP server would not take when it was sent (invitations, review notes, account
// links). Kept until a later attempt succeeds, so an outage of the mail server delays mail
// instead of losing it. Rows are kept after sending (sent_at set) as a record of delivery.
export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    to: text("to").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html").notNull(),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp("sent_at", { withTimezone: true }),
  },
  // The sender only ever looks for unsent rows that are due.
  (t) => [
    index("mail_outbox_due_idx")
      .on(t.nextAttemptAt)
      .where(sql`${t.sentAt} is null`),
  ],
);

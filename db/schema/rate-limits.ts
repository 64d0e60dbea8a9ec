import { integer, pgTable, primaryKey, text, timestamp } from "drizzle-orm/pg-core";

// Fixed-window counters: key is e.g. "sign-in:account:<email>:<address>" or "reset:ip:<address>".
// Kept in PostgreSQL so every app process shares them.
export const rateLimitBuckets = pgTable(
  "rate_limit_buckets",
  {
    key: text("key").notNull(),
    windowStart: timestamp("window_start", { withTimezone: true }).notNull(),
    count: integer("count").notNull().default(0),
  },
  (t) => [primaryKey({ columns: [t.key, t.windowStart] })],
);

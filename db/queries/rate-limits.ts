import { and, eq, lt, sql } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { rateLimitBuckets } from "@/db/schema/rate-limits";

// Fixed-window counters, one row per key and window start. The rules (limits, windows, the
// user's message) live in lib/server/access/rate-limit.ts.

/**
 * Counts one attempt in the key's window and returns the count so far. A single upsert keeps
 * it atomic under concurrent requests.
 */
export async function countRateLimitHit(
  db: Executor,
  key: string,
  windowStart: Date,
): Promise<number> {
  const [row] = await db
    .insert(rateLimitBuckets)
    .values({ key, windowStart, count: 1 })
    .onConflictDoUpdate({
      target: [rateLimitBuckets.key, rateLimitBuckets.windowStart],
      set: { count: sql`${rateLimitBuckets.count} + 1` },
    })
    .returning({ count: rateLimitBuckets.count });
  return row.count;
}

/** Drops the key's windows that started before this one. */
export async function deleteOlderRateLimitWindows(
  db: Executor,
  key: string,
  windowStart: Date,
): Promise<void> {
  await db
    .delete(rateLimitBuckets)
    .where(and(eq(rateLimitBuckets.key, key), lt(rateLimitBuckets.windowStart, windowStart)));
}

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

/** The key's count in this window without counting an attempt (0 when none is stored). */
export async function peekRateLimitCount(
  db: Executor,
  key: string,
  windowStart: Date,
): Promise<number> {
  const [row] = await db
    .select({ count: rateLimitBuckets.count })
    .from(rateLimitBuckets)
    .where(and(eq(rateLimitBuckets.key, key), eq(rateLimitBuckets.windowStart, windowStart)));
  return row?.count ?? 0;
}

/** Forgets every window of the key (a successful sign-in clears its own counter). */
export async function deleteRateLimitKey(db: Executor, key: string): Promise<void> {
  await db.delete(rateLimitBuckets).where(eq(rateLimitBuckets.key, key));
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

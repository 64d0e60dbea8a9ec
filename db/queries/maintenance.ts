import { lt, lte, or } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { mailOutbox } from "@/db/schema/mail-outbox";
import { rateLimitBuckets } from "@/db/schema/rate-limits";
import { sessions } from "@/db/schema/sessions";

// Deletes of rows whose reason has passed; the policy (which cut-off) lives in
// lib/server/maintenance/cleanup.ts.

/** Sessions idle past their expiry, or signed in before `signedInBefore` (absolute lifetime). */
export async function deleteDeadSessions(db: Executor, now: Date, signedInBefore: Date) {
  const rows = await db
    .delete(sessions)
    .where(or(lte(sessions.expiresAt, now), lte(sessions.signedInAt, signedInBefore)))
    .returning({ id: sessions.id });
  return rows.length;
}

export async function deleteRateLimitWindowsBefore(db: Executor, before: Date) {
  const rows = await db
    .delete(rateLimitBuckets)
    .where(lt(rateLimitBuckets.windowStart, before))
    .returning({ key: rateLimitBuckets.key });
  return rows.length;
}

/** Only mail that was sent; unsent mail stays until the sender delivers it. */
export async function deleteMailSentBefore(db: Executor, before: Date) {
  const rows = await db
    .delete(mailOutbox)
    .where(lt(mailOutbox.sentAt, before))
    .returning({ id: mailOutbox.id });
  return rows.length;
}

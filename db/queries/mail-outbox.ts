import { and, asc, eq, isNull, lte, sql } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { mailOutbox } from "@/db/schema/mail-outbox";

// Rows of the mail outbox. When to retry and what counts as sent is the sender's business
// (lib/server/email/mail-outbox.ts).

export async function insertOutboxMessage(
  db: Executor,
  values: typeof mailOutbox.$inferInsert,
): Promise<void> {
  await db.insert(mailOutbox).values(values);
}

/**
 * The oldest unsent message due by `now`, locked until the transaction ends; rows another
 * process holds are skipped, so two senders never take the same message.
 */
export async function lockNextDueOutboxMessage(tx: Executor, now: Date) {
  const [row] = await tx
    .select()
    .from(mailOutbox)
    .where(and(isNull(mailOutbox.sentAt), lte(mailOutbox.nextAttemptAt, now)))
    .orderBy(asc(mailOutbox.createdAt))
    .limit(1)
    .for("update", { skipLocked: true });
  return row;
}

export async function markOutboxMessageSent(
  tx: Executor,
  id: string,
  sent: { sentAt: Date; attempts: number },
): Promise<void> {
  await tx.update(mailOutbox).set(sent).where(eq(mailOutbox.id, id));
}

export async function markOutboxMessageFailed(
  tx: Executor,
  id: string,
  failure: { attempts: number; lastError: string; nextAttemptAt: Date },
): Promise<void> {
  await tx.update(mailOutbox).set(failure).where(eq(mailOutbox.id, id));
}

export async function countPendingOutboxMessages(db: Executor): Promise<number> {
  const [{ pending }] = await db
    .select({ pending: sql<number>`count(*)::int` })
    .from(mailOutbox)
    .where(isNull(mailOutbox.sentAt));
  return pending;
}

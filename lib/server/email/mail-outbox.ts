import "server-only";

import type { Db, Executor } from "@/db/client";
import {
  countPendingOutboxMessages,
  insertOutboxMessage,
  lockNextDueOutboxMessage,
  markOutboxMessageFailed,
  markOutboxMessageSent,
} from "@/db/queries/mail-outbox";

import type { Mailer, MailMessage, MailSendResult } from "../../shared/mail-types";

// The outbox's rules, free of Next and of the SMTP transport so tests drive them directly.
// A message goes to SMTP at once; if the server refuses or cannot be reached it is written to
// mail_outbox and the caller hears "queued", so it can tell the user the mail will follow.

/** Waits between attempts grow with each failure, capped: 5 s, 10 s, 20 s … 5 min. */
export function retryDelayMs(attempts: number): number {
  return Math.min(5_000 * 2 ** Math.max(0, attempts - 1), 5 * 60_000);
}

function reason(error: unknown): string {
  return (error instanceof Error ? error.message : String(error)).slice(0, 500);
}

/** Wraps a transport: failures are kept in the outbox instead of being thrown. */
export function durableMailer(db: Db, transport: Mailer, onQueued?: () => void): Mailer {
  return {
    async send(message: MailMessage): Promise<MailSendResult> {
      try {
        await transport.send(message);
        return { queued: false };
      } catch (error) {
        await insertOutboxMessage(db, {
          ...message,
          attempts: 1,
          lastError: reason(error),
          nextAttemptAt: new Date(Date.now() + retryDelayMs(1)),
        });
        console.error("[mail] queued for later:", message.to, reason(error));
        onQueued?.();
        return { queued: true };
      }
    },
  };
}

/**
 * Puts a message in the outbox, due at once, without touching SMTP: the sender delivers it
 * after the request has answered. Account mail (sign-up, reset) goes this way so the answer
 * takes the same time whether or not a mail was written.
 */
export async function queueMail(db: Executor, message: MailMessage, now = new Date()) {
  await insertOutboxMessage(db, { ...message, attempts: 0, nextAttemptAt: now });
}

/**
 * One pass over the due messages, oldest first. Stops at the first failure: the server is
 * most likely still down, and the rest would only fail the same way. Each row is locked while
 * it is sent (skip locked), so two app processes never send the same message twice.
 */
export async function flushOutbox(
  db: Db,
  transport: Mailer,
  now: () => Date = () => new Date(),
): Promise<{ sent: number; failed: number; pending: number }> {
  let sent = 0;
  let failed = 0;
  for (;;) {
    const outcome = await db.transaction(async (tx) => {
      const row = await lockNextDueOutboxMessage(tx, now());
      if (!row) return "empty" as const;
      try {
        await transport.send({ to: row.to, subject: row.subject, text: row.text, html: row.html });
        await markOutboxMessageSent(tx, row.id, { sentAt: now(), attempts: row.attempts + 1 });
        return "sent" as const;
      } catch (error) {
        await markOutboxMessageFailed(tx, row.id, {
          attempts: row.attempts + 1,
          lastError: reason(error),
          nextAttemptAt: new Date(now().getTime() + retryDelayMs(row.attempts + 1)),
        });
        return "failed" as const;
      }
    });
    if (outcome === "sent") sent++;
    else {
      if (outcome === "failed") failed++;
      break;
    }
  }
  const pending = await countPendingOutboxMessages(db);
  return { sent, failed, pending };
}

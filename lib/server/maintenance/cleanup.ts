import type { Executor } from "@/db/client";
import {
  deleteDeadSessions,
  deleteMailSentBefore,
  deleteRateLimitWindowsBefore,
} from "@/db/queries/maintenance";
import { SESSION_ABSOLUTE_DAYS } from "@/lib/server/accounts/auth/session-token";

// No `server-only`: the separate worker process (a tsx entry point) runs this too.

const DAY_MS = 24 * 60 * 60 * 1000;

/**
 * How long finished rows are kept. Rate-limit windows are at most an hour long, so a day-old
 * window counts for nothing; sent mail is kept a week as a record of delivery.
 */
const RETENTION = {
  rateLimitWindowsDays: 1,
  sentMailDays: 7,
} as const;

export interface CleanupResult {
  sessions: number;
  rateLimitWindows: number;
  sentMail: number;
}

/** One pass: delete expired sessions, old rate-limit windows and sent outbox mail. */
export async function cleanUpExpiredRows(db: Executor, now = new Date()): Promise<CleanupResult> {
  const ago = (days: number) => new Date(now.getTime() - days * DAY_MS);
  return {
    sessions: await deleteDeadSessions(db, now, ago(SESSION_ABSOLUTE_DAYS)),
    rateLimitWindows: await deleteRateLimitWindowsBefore(db, ago(RETENTION.rateLimitWindowsDays)),
    sentMail: await deleteMailSentBefore(db, ago(RETENTION.sentMailDays)),
  };
}

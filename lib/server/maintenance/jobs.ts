import type PgBoss from "pg-boss";

import { createDb, requireDatabaseUrl, type Db } from "@/db/client";

import { cleanUpExpiredRows } from "./cleanup";

// No `server-only`: the separate worker process (a tsx entry point) registers these too.

export const CLEANUP_QUEUE = "maintenance-cleanup";
/** Every hour at minute 17 (pg-boss cron, UTC); one instance takes each run. */
const CLEANUP_CRON = "17 * * * *";

/**
 * Schedules the hourly cleanup and works it on this boss. Safe to call from every process:
 * pg-boss keeps one schedule per queue name and hands each run to one worker. Without a `db`
 * (a worker process with no pool of its own yet) it opens a small pool from DATABASE_URL.
 */
export async function registerMaintenanceJobs(boss: PgBoss, db?: Db): Promise<void> {
  const handle = db ?? createDb(requireDatabaseUrl(), { max: 2 }).db;
  if (!(await boss.getQueue(CLEANUP_QUEUE))) {
    await boss.createQueue(CLEANUP_QUEUE, { name: CLEANUP_QUEUE, retryLimit: 1 });
  }
  await boss.schedule(CLEANUP_QUEUE, CLEANUP_CRON);
  await boss.work(CLEANUP_QUEUE, async () => {
    const removed = await cleanUpExpiredRows(handle);
    console.log(
      `[maintenance] removed ${removed.sessions} session(s), ${removed.rateLimitWindows} rate-limit window(s), ${removed.sentMail} sent mail(s)`,
    );
  });
}

import "server-only";

import type PgBoss from "pg-boss";

import { requireDatabaseUrl } from "@/db/client";
import { getDb } from "@/db/index";

import { registerMaintenanceJobs } from "@/lib/server/maintenance/jobs";

import { openStudyQueue } from "./queue";
import { startStudyWorker } from "./worker";

// One queue handle per server process, kept on globalThis across dev reloads.
const holder = globalThis as unknown as { __craqStudyQueue?: Promise<PgBoss> };

export function getStudyQueue(): Promise<PgBoss> {
  holder.__craqStudyQueue ??= openStudyQueue(requireDatabaseUrl()).catch((error) => {
    holder.__craqStudyQueue = undefined;
    throw error;
  });
  return holder.__craqStudyQueue;
}

/** Started once per app instance from instrumentation.ts: every instance takes a share of the jobs. */
export async function startAppStudyWorker(): Promise<void> {
  const boss = await getStudyQueue();
  await startStudyWorker(boss, getDb());
  // Hourly cleanup of expired sessions, old rate-limit windows and sent mail (issue 12).
  await registerMaintenanceJobs(boss, getDb());
}

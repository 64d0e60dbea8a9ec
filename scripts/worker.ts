/**
 * npm run worker — the job worker process: takes parameter-study jobs (and the hourly cleanup)
 * from the pg-boss queue in PostgreSQL and runs them (lib/server/handoff/studies/worker.ts). Run as many as you like, on any
 * machine that reaches the database; each takes a share of the jobs.
 * Needs DATABASE_URL. SIGTERM/SIGINT: finishes the jobs in hand (up to 30 s), then exits.
 *
 * Started with `--conditions=react-server` so the `server-only` marker of the job code loads.
 */
import { createDb, requireDatabaseUrl } from "@/db/client";
import { openStudyQueue } from "@/lib/server/handoff/studies/queue";
import { startStudyWorker } from "@/lib/server/handoff/studies/worker";
import { registerMaintenanceJobs } from "@/lib/server/maintenance/jobs";

const log = (message: string) => console.error(`[study worker ${process.pid}] ${message}`);

async function main() {
  const url = requireDatabaseUrl();
  const { db, close } = createDb(url, { max: 3 });
  const boss = await openStudyQueue(url);
  await startStudyWorker(boss, db);
  // Hourly cleanup of expired sessions, old rate-limit windows and sent mail (issue 12 item 6).
  await registerMaintenanceJobs(boss, db);
  log("waiting for study jobs");

  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    log("stopping");
    await boss.stop({ graceful: true, wait: true, timeout: 30_000 }).catch(() => {});
    await close().catch(() => {});
    process.exit(0);
  };
  process.on("SIGTERM", () => void stop());
  process.on("SIGINT", () => void stop());
}

main().catch((error: unknown) => {
  log(`failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});

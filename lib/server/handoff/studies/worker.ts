import "server-only";

/**
 * The worker of the study queue: runs one set per job and stores its CSV. A job that throws is
 * retried by pg-boss; on its last attempt the set is marked failed with the reason first.
 */
import type PgBoss from "pg-boss";

import type { Executor } from "@/db/client";
import { claimStudyItem, finishStudyItem } from "@/db/queries/studies";
import type { PathRunner } from "@/lib/scenario/run-scenario-file";
import { budgetedRunner, runBudgetMs } from "@/lib/server/handoff/runs/budgeted-runner";

import { STUDY_QUEUE, type StudyJob } from "./queue";
import { runStudySet } from "./run-set";

export interface StudyWorkerOptions {
  runner?: PathRunner;
  /** Seconds between polls when the queue is empty. */
  pollingIntervalSeconds?: number;
  /** Jobs fetched at once by this worker. */
  batchSize?: number;
  /** Called before each job (tests use it to coordinate two workers). */
  beforeJob?: (itemId: string) => Promise<void>;
}

const reasonOf = (error: unknown) =>
  (error instanceof Error ? error.message : String(error)).slice(0, 500);

async function processStudyJob(
  db: Executor,
  job: PgBoss.JobWithMetadata<StudyJob>,
  runner: PathRunner,
): Promise<void> {
  const claimed = await claimStudyItem(db, job.data.itemId);
  if (!claimed || claimed.item.state === "done") return; // deleted study, or a repeat delivery
  try {
    const { csv, status } = runStudySet(claimed.legs, claimed.item.set, runner);
    await finishStudyItem(db, claimed.item.id, { state: "done", csv, status, error: null });
  } catch (error) {
    if (job.retryCount >= job.retryLimit) {
      await finishStudyItem(db, claimed.item.id, {
        state: "failed",
        csv: null,
        status: null,
        error: reasonOf(error),
      });
    }
    throw error;
  }
}

/**
 * Jobs come in batches (a worker waits its polling interval between fetches, and one set takes
 * milliseconds); each job of a batch succeeds or fails on its own: a failing one is handed back
 * to pg-boss with boss.fail (retry, or failed on its last attempt), the rest complete together.
 */
export async function startStudyWorker(
  boss: PgBoss,
  db: Executor,
  options: StudyWorkerOptions = {},
) {
  const runner = options.runner ?? budgetedRunner(runBudgetMs());
  return boss.work<StudyJob>(
    STUDY_QUEUE,
    {
      includeMetadata: true,
      batchSize: options.batchSize ?? 8,
      pollingIntervalSeconds: options.pollingIntervalSeconds ?? 2,
    },
    async (jobs) => {
      for (const job of jobs) {
        try {
          await options.beforeJob?.(job.data.itemId);
          await processStudyJob(db, job, runner);
        } catch (error) {
          await boss.fail(STUDY_QUEUE, job.id, { reason: reasonOf(error) });
        }
      }
    },
  );
}

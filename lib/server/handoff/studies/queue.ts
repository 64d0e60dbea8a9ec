import "server-only";

/**
 * The parameter-study queue on pg-boss (its own schema "pgboss" in the app's database, created
 * at start). Each set of a study is one job, so every worker process (`npm run worker`) takes a share.
 */
import PgBoss from "pg-boss";

import type { Executor } from "@/db/client";
import { executePositionalStatement } from "@/db/queries/positional-statement";

export const STUDY_QUEUE = "parameter-study-set";

export interface StudyJob {
  itemId: string;
}

export interface QueueOptions {
  /** Attempts after the first before a set is marked failed. */
  retryLimit?: number;
  /** Seconds between attempts. */
  retryDelay?: number;
}

export async function openStudyQueue(connectionString: string, options: QueueOptions = {}) {
  const boss = new PgBoss({ connectionString, max: 3, application_name: "craquelure-studies" });
  boss.on("error", (error) => console.error("[study queue]", error));
  await boss.start();
  const policy = {
    name: STUDY_QUEUE,
    retryLimit: options.retryLimit ?? 2,
    retryDelay: options.retryDelay ?? 5,
    retryBackoff: false,
    expireInSeconds: 15 * 60,
  };
  // createQueue leaves an existing queue as it is; the update makes this instance's policy hold.
  if (await boss.getQueue(STUDY_QUEUE)) await boss.updateQueue(STUDY_QUEUE, policy);
  else await boss.createQueue(STUDY_QUEUE, policy);
  return boss;
}

/**
 * pg-boss's own statements run on one of our handles (a transaction among them): its `$n`
 * placeholders become bound parameters of a drizzle query, so the jobs commit or roll back with
 * the rows they point at.
 */
export function bossDbOn(db: Executor): PgBoss.Db {
  return {
    async executeSql(text: string, values: unknown[]) {
      return { rows: await executePositionalStatement(db, text, values) };
    },
  };
}

/** Jobs for the given study items; pass the transaction that inserted them as `db`. */
export async function enqueueStudyItems(
  boss: PgBoss,
  itemIds: string[],
  db?: Executor,
): Promise<void> {
  await boss.insert(
    itemIds.map((itemId) => ({ name: STUDY_QUEUE, data: { itemId } satisfies StudyJob })),
    db ? { db: bossDbOn(db) } : {},
  );
}

import "server-only";

/**
 * A PathRunner for the server: runs the core in chunks and gives up once the run has used its
 * time budget, so one request cannot hold a CPU for minutes. The clock is injected so tests
 * can exceed the budget without waiting.
 */
import { PathRun } from "@/lib/mechanics/driver";
import type { Leg, MaterialParams } from "@/lib/mechanics/types";
import type { PathRunner } from "@/lib/scenario/run-scenario-file";

/** Increments between two looks at the clock: small enough to stop promptly, cheap to check. */
export const CHUNK_INCREMENTS = 8192;

const DEFAULT_RUN_BUDGET_MS = 20_000;

export class TimeBudgetExceeded extends Error {
  /** Passes through the run function (run-scenario-file.ts) instead of reading as a core fault. */
  readonly stopsRun = true;

  constructor(readonly budgetMs: number) {
    super(`run exceeded its time budget of ${budgetMs / 1000} s`);
    this.name = "TimeBudgetExceeded";
  }
}

export type Clock = () => number;

/** CPU time of this process in milliseconds (user + system). */
const cpuClock: Clock = () => {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1000;
};

export function runBudgetMs(): number {
  const fromEnv = Number(process.env.RUN_TIME_BUDGET_MS);
  return Number.isFinite(fromEnv) && fromEnv > 0 ? fromEnv : DEFAULT_RUN_BUDGET_MS;
}

export function budgetedRunner(budgetMs: number, clock: Clock = cpuClock): PathRunner {
  return (params: MaterialParams, legs: Leg[]) => {
    const start = clock();
    const run = new PathRun(params, legs);
    while (!run.done) {
      run.advance(CHUNK_INCREMENTS);
      if (!run.done && clock() - start > budgetMs) throw new TimeBudgetExceeded(budgetMs);
    }
    return run.result();
  };
}

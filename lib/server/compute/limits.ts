/**
 * The compute pool's limits, read from the environment with defaults that suit a small machine.
 * Pure (the environment is passed in) so the defaults and the parsing are unit-tested.
 * No `server-only`: the unit tests and the worker build read this file outside Next.
 */
export interface ComputeLimits {
  /** Worker threads of this instance. */
  threads: number;
  /** Tasks running or waiting in this instance; one more answers 503. */
  maxTasks: number;
  /** Tasks running or waiting for one person (user or token owner); one more answers 429. */
  maxTasksPerPerson: number;
  /** Wall-clock budget of one task once a thread has taken it, in milliseconds. */
  budgetMs: number;
  /** What Retry-After says when the pool is full, in seconds. */
  retryAfterSeconds: number;
}

type Env = Record<string, string | undefined>;

function positiveInt(value: string | undefined): number | null {
  const n = Number(value);
  return Number.isInteger(n) && n > 0 ? n : null;
}

/** `cores` is the machine's parallelism; one core is left to the request thread. */
export function computeLimits(env: Env, cores: number): ComputeLimits {
  const threads = positiveInt(env.COMPUTE_THREADS) ?? Math.max(1, cores - 1);
  return {
    threads,
    maxTasks: positiveInt(env.COMPUTE_MAX_TASKS) ?? Math.max(8, threads * 4),
    maxTasksPerPerson: positiveInt(env.COMPUTE_MAX_TASKS_PER_PERSON) ?? 2,
    budgetMs:
      positiveInt(env.COMPUTE_TIME_BUDGET_MS) ?? positiveInt(env.RUN_TIME_BUDGET_MS) ?? 20_000,
    retryAfterSeconds: positiveInt(env.COMPUTE_RETRY_AFTER_S) ?? 5,
  };
}

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

/**
 * Compute threads of one app process. The rule: on a machine with `cores` ≥ 2, all app processes
 * together run at most `cores − 1` compute threads, so one core is always left to the request
 * threads: each of `processes` app processes (scripts/serve.ts says how many through
 * CRAQUELURE_APP_PROCESSES) gets `floor((cores − 1) / processes)`. A process needs at least one
 * thread to compute at all, so where there are more processes than `cores − 1` (2 cores, 2
 * processes) each keeps one and the total is one over: there the compute threads' nice 10
 * (worker/niceness.ts) is what keeps the request threads first. One core: one thread.
 */
export function defaultComputeThreads(cores: number, processes: number): number {
  return Math.max(1, Math.floor((cores - 1) / Math.max(1, processes)));
}

/**
 * `cores` is the machine's parallelism. COMPUTE_THREADS, when set, overrides the rule above;
 * without CRAQUELURE_APP_PROCESSES (next dev, the tests) this is the only app process.
 */
export function computeLimits(env: Env, cores: number): ComputeLimits {
  const processes = positiveInt(env.CRAQUELURE_APP_PROCESSES) ?? 1;
  const threads = positiveInt(env.COMPUTE_THREADS) ?? defaultComputeThreads(cores, processes);
  return {
    threads,
    maxTasks: positiveInt(env.COMPUTE_MAX_TASKS) ?? Math.max(8, threads * 4),
    maxTasksPerPerson: positiveInt(env.COMPUTE_MAX_TASKS_PER_PERSON) ?? 2,
    budgetMs:
      positiveInt(env.COMPUTE_TIME_BUDGET_MS) ?? positiveInt(env.RUN_TIME_BUDGET_MS) ?? 20_000,
    retryAfterSeconds: positiveInt(env.COMPUTE_RETRY_AFTER_S) ?? 5,
  };
}

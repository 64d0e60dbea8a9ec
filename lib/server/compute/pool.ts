import "server-only";

/**
 * The compute pool: worker threads (piscina) for everything that runs the core or parses an
 * upload, so the request thread only reads, writes and answers. Each task passes the gate (caps
 * per person and per instance), then has a wall-clock budget counted from the moment a thread
 * takes it; past the budget the task is aborted, which ends its thread (piscina starts another).
 * One pool per process, kept on globalThis: Next may load this module once per route bundle.
 */
import { availableParallelism } from "node:os";
import { pathToFileURL } from "node:url";
import { MessageChannel, type MessagePort } from "node:worker_threads";

import { Piscina } from "piscina";

import { AppError, type ErrorCode } from "@/lib/shared/errors";
import { DetailedAppError } from "@/lib/server/workspace/errors";

import { ComputeBusy, overBudget, type TaskLabel } from "./errors";
import { computeLimits, type ComputeLimits } from "./limits";
import { TaskGate } from "./task-gate";
import type { ComputeTask, PortMessage, TaskOutcome } from "./worker/task-types";
import { computeWorkerFile } from "./worker-file";

interface ComputePool {
  piscina: Piscina;
  gate: TaskGate;
  limits: ComputeLimits;
}

const KEY = Symbol.for("craquelure.compute-pool");
type Holder = { [KEY]?: ComputePool };

function pool(): ComputePool {
  const holder = globalThis as Holder;
  if (!holder[KEY]) {
    const limits = computeLimits(process.env, availableParallelism());
    const piscina = new Piscina({
      filename: pathToFileURL(computeWorkerFile()).href,
      minThreads: 1,
      maxThreads: limits.threads,
      // The gate already bounds what waits; the pool's own queue takes whatever it lets in.
      maxQueue: limits.maxTasks,
      idleTimeout: 60_000,
    });
    holder[KEY] = { piscina, gate: new TaskGate(limits), limits };
  }
  return holder[KEY];
}

export function computeBudgetMs(): number {
  return pool().limits.budgetMs;
}

export interface StartedTask<T> {
  /** The task's value; rejects with the over-budget or expected error of the task. */
  done: Promise<T>;
  /** Messages the task posts after its start (a run's head and chunks). */
  onMessage(listener: (message: PortMessage) => void): void;
  /** Stops the task (the client went away). */
  cancel(): void;
}

function rebuild(error: NonNullable<Extract<TaskOutcome, { ok: false }>["error"]>): AppError {
  const code = error.code as ErrorCode;
  return error.details
    ? new DetailedAppError(code, error.message, error.details, error.field)
    : new AppError(code, error.message, error.field);
}

/**
 * Admits and starts one task. Throws ComputeBusy at once when a cap is reached. `person` is the
 * signed-in user or the token's owner; null for work nobody in particular asked for.
 */
export function startTask<T>(
  task: ComputeTask,
  person: string | null,
  label: TaskLabel,
): StartedTask<T> {
  const { piscina, gate, limits } = pool();
  const admission = gate.enter(person);
  if (!admission.ok) {
    throw new ComputeBusy(admission.reason, admission.retryAfterSeconds, limits.maxTasksPerPerson);
  }
  const channel = new MessageChannel();
  const port: MessagePort = channel.port1;
  const abort = new AbortController();
  let timer: NodeJS.Timeout | undefined;
  let overTime = false;
  const listeners: ((message: PortMessage) => void)[] = [];
  port.on("message", (message: PortMessage) => {
    if (message.type === "start") {
      timer = setTimeout(() => {
        overTime = true;
        abort.abort();
      }, limits.budgetMs);
      return;
    }
    for (const listener of listeners) listener(message);
    if (message.type === "end") port.close();
  });
  const done = piscina
    .run({ ...task, port: channel.port2 }, { transferList: [channel.port2], signal: abort.signal })
    .then(
      (outcome: TaskOutcome<T>) => {
        if (!outcome.ok) throw rebuild(outcome.error);
        return outcome.value;
      },
      (error: unknown) => {
        if (overTime) throw overBudget(label, limits.budgetMs);
        throw error;
      },
    )
    .finally(() => {
      clearTimeout(timer);
      admission.leave();
    });
  // A run's port closes on its "end" message; every other task's once the task has settled.
  done.then(
    () => {
      if (task.kind !== "run") port.close();
    },
    () => port.close(),
  );
  return {
    done,
    onMessage: (listener) => void listeners.push(listener),
    cancel: () => abort.abort(),
  };
}

/** A task whose value is all the caller needs. */
export function compute<T>(task: ComputeTask, person: string | null, label: TaskLabel): Promise<T> {
  return startTask<T>(task, person, label).done;
}

/** Tasks in flight for one person (or the whole instance): for tests and diagnostics. */
export function tasksInFlight(person?: string): number {
  return pool().gate.inFlight(person);
}

/** For tests and shutdown: ends every thread. */
export async function closeComputePool(): Promise<void> {
  const holder = globalThis as Holder;
  const current = holder[KEY];
  delete holder[KEY];
  if (current) await current.piscina.destroy();
}

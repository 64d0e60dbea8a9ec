/**
 * Main-thread side of the solver: one worker per running set, a warm spare so a new run starts
 * at once, cancel = terminate + take the spare, dispose on unmount. The main thread never
 * integrates; it only receives chunks.
 */
import * as Comlink from "comlink";
import type { Leg, MaterialParams, RunStatus } from "@/lib/mechanics/types";
import type { ResultChunk } from "@/lib/client/loading-desk/result-buffer";
import type { SolverApi, SolverSink } from "./solver.worker";

export interface RunHandlers {
  onStart(totalRows: number): void;
  onChunk(chunk: ResultChunk): void;
  /** `scope` is the global scope the run happened in ("DedicatedWorkerGlobalScope"). */
  onDone(status: RunStatus, scope: string): void;
  onError(message: string): void;
}

interface Slot {
  worker: Worker;
  api: Comlink.Remote<SolverApi>;
  runId: number;
  handlers: RunHandlers | null;
  /** Rows received for the current run, and its completion waiting for the last chunks. */
  received: number;
  finish: { rows: number; done: () => void } | null;
}

/** A message fit for the page: the error's own words, never a stack. */
export function userMessage(err: unknown): string {
  const text = err instanceof Error ? err.message : String(err);
  const first = text.split("\n")[0].trim();
  return first
    ? `The solver could not run this case: ${first}`
    : "The solver stopped unexpectedly.";
}

export class SolverPool {
  private active = new Map<string, Slot>();
  private idle: Slot[] = [];
  private nextRunId = 1;
  private disposed = false;

  constructor() {
    this.idle.push(this.spawn());
  }

  private spawn(): Slot {
    const worker = new Worker(new URL("./solver.worker.ts", import.meta.url), { name: "solver" });
    const api = Comlink.wrap<SolverApi>(worker);
    const slot: Slot = { worker, api, runId: 0, handlers: null, received: 0, finish: null };
    const sink: SolverSink = {
      start: (id, total) => id === slot.runId && slot.handlers?.onStart(total),
      chunk: (id, chunk) => {
        if (id !== slot.runId || !slot.handlers) return;
        slot.handlers.onChunk(chunk);
        slot.received += chunk.count;
        if (slot.finish && slot.received >= slot.finish.rows) slot.finish.done();
      },
    };
    void api.connect(Comlink.proxy(sink));
    worker.addEventListener("error", (e) => {
      e.preventDefault();
      this.fail(slot, "The solver stopped unexpectedly; change a value to try again.");
    });
    return slot;
  }

  private fail(slot: Slot, message: string) {
    const handlers = slot.handlers;
    this.retire(slot);
    handlers?.onError(message);
  }

  /** Terminates a slot's worker and forgets it. */
  private retire(slot: Slot) {
    slot.handlers = null;
    slot.runId = -1;
    slot.worker.terminate();
    for (const [key, s] of this.active) if (s === slot) this.active.delete(key);
    this.idle = this.idle.filter((s) => s !== slot);
  }

  private take(): Slot {
    const slot = this.idle.pop() ?? this.spawn();
    // Keep one warm worker ready for the next edit.
    if (this.idle.length === 0)
      setTimeout(() => !this.disposed && this.idle.length === 0 && this.idle.push(this.spawn()), 0);
    return slot;
  }

  /** Starts a run for `key`, cancelling the one in flight for the same key. */
  run(key: string, params: MaterialParams, legs: Leg[], handlers: RunHandlers): void {
    this.cancel(key);
    const slot = this.take();
    const runId = this.nextRunId++;
    slot.runId = runId;
    slot.handlers = handlers;
    slot.received = 0;
    slot.finish = null;
    this.active.set(key, slot);
    slot.api.run(runId, params, legs).then(
      ({ status, scope, rows }) => {
        if (slot.runId !== runId) return;
        // The result and the chunks travel on different channels: finish after the last chunk.
        const done = () => {
          if (slot.runId !== runId) return;
          slot.handlers = null;
          slot.finish = null;
          this.active.delete(key);
          if (this.idle.length < 2) this.idle.push(slot);
          else slot.worker.terminate();
          handlers.onDone(status, scope);
        };
        if (slot.received >= rows) done();
        else slot.finish = { rows, done };
      },
      (err: unknown) => {
        if (slot.runId !== runId) return;
        slot.handlers = null;
        this.active.delete(key);
        this.idle.push(slot);
        handlers.onError(userMessage(err));
      },
    );
  }

  /** Stops the run of `key` now: its worker is terminated (a running loop cannot be interrupted). */
  cancel(key: string): void {
    const slot = this.active.get(key);
    if (slot) this.retire(slot);
  }

  dispose(): void {
    this.disposed = true;
    for (const slot of [...this.active.values(), ...this.idle]) slot.worker.terminate();
    this.active.clear();
    this.idle = [];
  }
}

/**
 * Results of every parameter set on the main thread, outside React: the solver fills it, charts
 * and the table subscribe. `generation` counts run batches (one per accepted edit).
 */
import type { RunStatus } from "@/lib/mechanics/types";
import { ResultBuffer, type ResultChunk } from "./result-buffer";

export interface SetRun {
  buffer: ResultBuffer | null;
  error: string | null;
  running: boolean;
  /** Generation that started this run. */
  gen: number;
}

export class ResultsStore {
  private runs = new Map<string, SetRun>();
  private listeners = new Set<() => void>();
  version = 0;
  generation = 0;

  /** Starts a new batch of runs (one accepted edit); returns its number. */
  nextGeneration(): number {
    return ++this.generation;
  }

  get(id: string): SetRun | undefined {
    return this.runs.get(id);
  }

  /** True when no set of the current generation is still computing. */
  get settled(): boolean {
    for (const r of this.runs.values()) if (r.running) return false;
    return true;
  }

  subscribe(fn: () => void): () => void {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  }

  private changed() {
    this.version++;
    for (const fn of this.listeners) fn();
  }

  begin(id: string, gen: number) {
    const prev = this.runs.get(id);
    // Keep the previous curve on screen until the first rows of the new run arrive.
    this.runs.set(id, { buffer: prev?.buffer ?? null, error: null, running: true, gen });
  }

  start(id: string, total: number) {
    const r = this.runs.get(id);
    if (r) r.buffer = new ResultBuffer(total);
  }

  chunk(id: string, chunk: ResultChunk) {
    const r = this.runs.get(id);
    if (!r?.buffer) return;
    r.buffer.append(chunk);
    this.changed();
  }

  done(id: string, status: RunStatus) {
    const r = this.runs.get(id);
    if (!r) return;
    r.running = false;
    r.buffer?.finish(status);
    this.changed();
  }

  fail(id: string, message: string) {
    const r = this.runs.get(id);
    if (!r) return;
    r.running = false;
    r.error = message;
    r.buffer = null;
    this.changed();
  }

  /** Forgets sets that no longer exist. */
  retain(ids: readonly string[]) {
    let removed = false;
    for (const id of [...this.runs.keys()])
      if (!ids.includes(id)) removed = this.runs.delete(id) || removed;
    if (removed) this.changed();
  }
}

/**
 * Drives a path run in slices and hands out the new rows as chunks, so the page can draw while
 * the rest computes. Runs in the worker; pure, so it is tested under node with the real core.
 * The first chunk goes out after `firstMs`, later ones about every `everyMs`.
 */
import type { ResultColumns, RunStatus } from "@/lib/mechanics/types";
import { type ResultChunk, sliceChunk } from "./result-buffer";

/** What the driver (lib/mechanics/driver.ts PathRun) offers. */
export interface SteppedRun {
  readonly columns: ResultColumns;
  readonly rows: number;
  readonly status: RunStatus;
  /** true once the path is complete or stopped by a failure */
  readonly done: boolean;
  advance(maxIncrements: number): unknown;
}

export interface ChunkTiming {
  firstMs: number;
  everyMs: number;
  now: () => number;
}

const DEFAULT_TIMING: ChunkTiming = {
  firstMs: 4,
  everyMs: 40,
  now: () => performance.now(),
};

export function runInChunks(
  run: SteppedRun,
  emit: (chunk: ResultChunk) => void,
  timing: ChunkTiming = DEFAULT_TIMING,
): RunStatus {
  let sent = 0;
  let batch = 16;
  let budget = timing.firstMs;
  let since = timing.now();
  let finished = false;
  while (!finished) {
    const t0 = timing.now();
    run.advance(batch);
    finished = run.done;
    const t1 = timing.now();
    // Aim each slice at ~2 ms so a chunk is never late by much.
    const perInc = (t1 - t0) / batch;
    batch = Math.max(1, Math.min(4096, Math.round(2 / Math.max(perInc, 1e-4))));
    if (!finished && t1 - since >= budget && run.rows > sent) {
      emit(sliceChunk(run.columns, sent, run.rows - sent));
      sent = run.rows;
      since = t1;
      budget = timing.everyMs;
    }
  }
  if (run.rows > sent) emit(sliceChunk(run.columns, sent, run.rows - sent));
  return run.status;
}

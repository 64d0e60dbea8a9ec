/// <reference lib="webworker" />
/**
 * The solver worker: exposes the core over comlink and streams rows back as transferable
 * chunks. No logic of its own beyond wiring; see lib/client/loading-desk/chunked-run.ts.
 */
import * as Comlink from "comlink";
import { PathRun } from "@/lib/mechanics/driver";
import type { Leg, MaterialParams, RunStatus } from "@/lib/mechanics/types";
import { runInChunks } from "@/lib/client/loading-desk/chunked-run";
import { chunkTransferables, type ResultChunk } from "@/lib/client/loading-desk/result-buffer";

export interface SolverSink {
  start(runId: number, totalRows: number): void;
  chunk(runId: number, chunk: ResultChunk): void;
}

let sink: SolverSink | null = null;

const api = {
  connect(s: SolverSink) {
    sink = s;
  },
  /** Runs the path; `scope` names the global scope it ran in (for the browser test). */
  run(
    runId: number,
    params: MaterialParams,
    legs: Leg[],
  ): { status: RunStatus; scope: string; rows: number } {
    const run = new PathRun(params, legs);
    sink?.start(runId, run.columns.increment.length);
    const status = runInChunks(run, (chunk) =>
      sink?.chunk(runId, Comlink.transfer(chunk, chunkTransferables(chunk))),
    );
    // `rows` lets the page wait for chunks still in flight on the sink's own channel.
    return { status, scope: Object.prototype.toString.call(self).slice(8, -1), rows: run.rows };
  },
};

export type SolverApi = typeof api;

Comlink.expose(api);

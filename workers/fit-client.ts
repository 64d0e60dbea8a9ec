/**
 * Main-thread side of the fit worker: one worker per refinement, cancel = terminate (the worker
 * is busy inside Levenberg–Marquardt and cannot read a message), dispose on unmount.
 */
import * as Comlink from "comlink";

import type { RefineProgress, RefineResult } from "@/lib/calibration/refine";
import type { Bounds, FittableParam } from "@/lib/calibration/refine-params";
import type { TestRecordInput } from "@/lib/calibration/types";
import type { MaterialParams } from "@/lib/mechanics/types";

import type { FitWorkerApi } from "./fit.worker";

export class FitCancelled extends Error {
  /** The last round's report, whose `best` values the page keeps; null before the first round. */
  constructor(readonly last: RefineProgress | null = null) {
    super("The refinement was cancelled.");
  }
}

export class FitClient {
  private worker: Worker | null = null;
  private reject: ((e: unknown) => void) | null = null;
  private last: RefineProgress | null = null;

  async refine(
    records: TestRecordInput[],
    start: MaterialParams,
    free: FittableParam[],
    bounds: Bounds,
    onProgress: (p: RefineProgress) => void,
  ): Promise<RefineResult> {
    this.cancel();
    this.last = null;
    const worker = new Worker(new URL("./fit.worker.ts", import.meta.url), { name: "fit" });
    this.worker = worker;
    const api = Comlink.wrap<FitWorkerApi>(worker);
    try {
      return await new Promise<RefineResult>((resolve, reject) => {
        this.reject = reject;
        const report = (p: RefineProgress) => {
          this.last = p;
          onProgress(p);
        };
        api.refine(records, start, free, bounds, Comlink.proxy(report)).then(resolve, reject);
      });
    } finally {
      if (this.worker === worker) this.dispose();
    }
  }

  cancel(): void {
    this.reject?.(new FitCancelled(this.last));
    this.dispose();
  }

  dispose(): void {
    this.worker?.terminate();
    this.worker = null;
    this.reject = null;
  }
}

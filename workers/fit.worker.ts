/// <reference lib="webworker" />
/**
 * The fit worker: runs the least-squares refinement (lib/calibration/refine.ts) off the main
 * thread and reports each round. Cancel is terminate-and-respawn on the main thread side.
 */
import * as Comlink from "comlink";

import { refine, type RefineProgress } from "@/lib/calibration/refine";
import type { Bounds, FittableParam } from "@/lib/calibration/refine-params";
import type { TestRecordInput } from "@/lib/calibration/types";
import type { MaterialParams } from "@/lib/mechanics/types";

const api = {
  refine(
    records: TestRecordInput[],
    start: MaterialParams,
    free: FittableParam[],
    bounds: Bounds,
    onProgress: (p: RefineProgress) => void,
  ) {
    return refine(records, start, { free, bounds, onProgress });
  },
};

export type FitWorkerApi = typeof api;

Comlink.expose(api);

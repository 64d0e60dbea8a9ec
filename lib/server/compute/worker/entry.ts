/**
 * The compute worker's entry (bundled by build-worker.ts into a plain JS file piscina loads).
 * Announces the start on the task's port, so the request thread counts the budget from here and
 * not from the queue, runs the task, and sends expected errors as data: an AppError's class and
 * fields do not survive the thread boundary.
 */
import { identify } from "@/lib/calibration/identify";
import { uncertaintyAt } from "@/lib/calibration/refine";
import { replayError, canReplay } from "@/lib/calibration/replay";
import { readRecordCsv } from "@/lib/csv/read-record-csv";
import { isAppError } from "@/lib/shared/errors";
import { buildReferenceBundle } from "@/lib/server/handoff/bundle/build";
import { runConformance } from "@/lib/server/handoff/conformance/run-check";
import { DetailedAppError } from "@/lib/server/workspace/errors";

import { lowerOwnPriority } from "./niceness";
import { reportCurvesInWorker } from "./report-curves-task";
import { runInWorker } from "./run-task";
import type { ComputeTask, CurveCsvOutcome, PostedTask, TaskOutcome } from "./task-types";

// First thing in the thread: yield the core to the request threads (niceness.ts).
lowerOwnPriority();

function readCurveCsvInWorker(task: Extract<ComputeTask, { kind: "read-curve-csv" }>) {
  // Only what the upload stores comes back: the table's cells stay in the worker.
  const read = readRecordCsv(task.text, task.mapping);
  const outcome: CurveCsvOutcome = read.ok
    ? {
        ok: true,
        points: read.points,
        headers: read.table.headers,
        warnings: read.warnings,
        layout: read.layout,
        choice: read.choice,
        conversion: read.conversion,
      }
    : { ok: false, error: read.error };
  return outcome;
}

function perform(task: ComputeTask, port: PostedTask["port"]): unknown {
  switch (task.kind) {
    case "run":
      return runInWorker(task.request, port, task.credit);
    case "report-curves":
      return reportCurvesInWorker(task.sets, task.legs, task.perSetBudgetMs);
    case "conformance": {
      const { result, curves } = runConformance(
        task.scenario,
        task.setId,
        task.text,
        task.tolerance,
        task.mapping,
      );
      return { result, curves };
    }
    case "replay-residuals":
      return task.records
        .filter((r) => canReplay(r.input.testType))
        .map((r) => {
          const n = r.input.points.strain.length;
          const squared = replayError(task.params, r.input.testType, r.input.points);
          const rms = Number.isFinite(squared) && n > 0 ? Math.sqrt(squared / n) : -1;
          return { id: r.id, rms, points: n };
        });
    case "identify":
      return identify(task.records, task.options);
    case "fit-uncertainty":
      return uncertaintyAt(task.records, task.params, { free: task.free, bounds: task.bounds });
    case "read-curve-csv":
      return readCurveCsvInWorker(task);
    case "reference-bundle":
      // Every standard load case of every set is run and zipped here: only the zip comes back.
      return buildReferenceBundle(task.file, task.scenario, task.identity);
  }
}

export default async function computeTask(posted: PostedTask): Promise<TaskOutcome> {
  const { port, ...task } = posted;
  port.postMessage({ type: "start" });
  try {
    // Awaited here so a task that ends in a promise (the bundle's zip) sends its value, not the promise.
    return { ok: true, value: await perform(task as ComputeTask, port) };
  } catch (error) {
    if (!isAppError(error)) throw error;
    return {
      ok: false,
      error: {
        code: error.code,
        message: error.message,
        field: error.field,
        details: error instanceof DetailedAppError ? error.details : undefined,
      },
    };
  }
  // The port is closed by the request thread once it has read the last message.
}

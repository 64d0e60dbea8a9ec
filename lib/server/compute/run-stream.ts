import "server-only";

/**
 * `POST /api/v1/runs` through the pool: waits until the worker has run the path (or failed),
 * then answers with a stream fed by the worker's chunks as they arrive. A failure before the
 * head is an ordinary error answer; one after it (the budget ran out while formatting) cuts the
 * stream, as a dropped connection would. A client that goes away cancels the task. The worker
 * posts a chunk only when the stream has asked for one (chunk-credit.ts), so a run's output
 * never piles up here faster than the socket drains.
 */
import type { RunRequest } from "@/lib/server/handoff/runs/run-request";

import { grantChunk, newChunkCredit } from "./chunk-credit";
import { startTask } from "./pool";

export interface RunStream {
  body: ReadableStream<Uint8Array>;
  contentType: string;
  warnings: string[];
}

export function runInPool(request: RunRequest, person: string | null): Promise<RunStream> {
  const credit = newChunkCredit();
  const task = startTask<null>({ kind: "run", request, credit }, person, "run");
  let controller!: ReadableStreamDefaultController<Uint8Array>;
  let closed = false;
  const body = new ReadableStream<Uint8Array>({
    start: (c) => void (controller = c),
    // Called whenever the stream's queue is below its mark (one chunk): the worker may post another.
    pull: () => grantChunk(credit),
    cancel: () => {
      closed = true;
      task.cancel();
    },
  });
  return new Promise<RunStream>((resolve, reject) => {
    task.onMessage((message) => {
      if (closed) return;
      if (message.type === "head") {
        resolve({
          body,
          contentType: request.format === "csv" ? "text/csv; charset=utf-8" : "application/json",
          warnings: message.warnings,
        });
      } else if (message.type === "chunk") {
        controller.enqueue(message.bytes);
      } else if (message.type === "end") {
        closed = true;
        controller.close();
      }
    });
    task.done.catch((error: unknown) => {
      reject(error); // no effect once the head has resolved the promise
      if (!closed) {
        closed = true;
        controller.error(error);
      }
    });
  });
}

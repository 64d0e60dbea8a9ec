/**
 * `POST /api/v1/runs` inside a compute worker: the one run function the command line uses, its output posted
 * chunk by chunk (each one's bytes transferred, never copied or joined) through the task's port,
 * no faster than the response takes them when the request thread passes a credit counter
 * (chunk-credit.ts).
 */
import type { MessagePort } from "node:worker_threads";

import { runPath } from "@/lib/mechanics/driver";
import { runScenarioFile, type PathRunner } from "@/lib/scenario/run-scenario-file";
import { AppError } from "@/lib/shared/errors";
import type { RunRequest } from "@/lib/server/handoff/runs/run-request";

import { takeChunk, type ChunkCredit } from "../chunk-credit";
import type { PortMessage } from "./task-types";

/** The name the driver's messages use for the file: the request body. */
const FILE_NAME = "body";

function post(port: MessagePort, message: PortMessage, transfer: ArrayBuffer[] = []): void {
  port.postMessage(message, transfer);
}

export function runInWorker(
  request: RunRequest,
  port: MessagePort,
  credit: ChunkCredit | undefined,
): null {
  const encoder = new TextEncoder();
  // The warnings are known once the path has run, before the first byte of output: they go
  // ahead of the body so the request thread can put them in a header.
  const runner: PathRunner = (params, legs) => {
    const result = runPath(params, legs);
    post(port, { type: "head", warnings: [...result.status.warnings] });
    return result;
  };
  const outcome = runScenarioFile(
    request.scenario,
    { setId: request.setId, format: request.format, fileName: FILE_NAME },
    runner,
    (text) => {
      if (credit) takeChunk(credit);
      const bytes = encoder.encode(text);
      post(port, { type: "chunk", bytes }, [bytes.buffer as ArrayBuffer]);
    },
  );
  // A bad file or set is the user's (400); anything else is a fault of ours (masked 500).
  if (outcome.kind === "bad-input") throw new AppError("invalid:file", outcome.message);
  if (outcome.kind === "internal") throw new Error(outcome.message);
  post(port, { type: "end" });
  return null;
}

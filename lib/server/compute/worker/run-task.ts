/**
 * `POST /api/v1/runs` inside a compute worker: the command-line driver itself, its output posted
 * chunk by chunk (each one's bytes transferred, never copied or joined) through the task's port.
 */
import type { MessagePort } from "node:worker_threads";

import { runPath } from "@/lib/mechanics/driver";
import {
  runDriveCommand,
  EXIT_BAD_INPUT,
  EXIT_OK,
  type PathRunner,
} from "@/lib/scenario/drive-command";
import { AppError } from "@/lib/shared/errors";
import type { RunRequest } from "@/lib/server/handoff/runs/run-request";

import type { PortMessage } from "./task-types";

/** The name the driver's messages use for the file: the request body. */
const FILE_NAME = "body";

function post(port: MessagePort, message: PortMessage, transfer: ArrayBuffer[] = []): void {
  port.postMessage(message, transfer);
}

export function runInWorker(request: RunRequest, port: MessagePort): null {
  const encoder = new TextEncoder();
  const err: string[] = [];
  // The warnings are known once the path has run, before the first byte of output: they go
  // ahead of the body so the request thread can put them in a header.
  const runner: PathRunner = (params, legs) => {
    const result = runPath(params, legs);
    post(port, { type: "head", warnings: [...result.status.warnings] });
    return result;
  };
  const argv = [FILE_NAME, `--format=${request.format}`];
  if (request.setId !== null) argv.push(`--set=${request.setId}`);
  const code = runDriveCommand(
    argv,
    {
      readFile: () => JSON.stringify(request.scenario),
      stdout: (text) => {
        const bytes = encoder.encode(text);
        post(port, { type: "chunk", bytes }, [bytes.buffer as ArrayBuffer]);
      },
      stderr: (line) => void err.push(line),
    },
    runner,
  );
  // Exit 2 is the user's file or choice of set; anything else is a fault of ours (masked 500).
  if (code === EXIT_BAD_INPUT)
    throw new AppError("invalid:file", err[0] ?? "The file is not valid.");
  if (code !== EXIT_OK) throw new Error(err[0] ?? "the driver failed");
  post(port, { type: "end" });
  return null;
}

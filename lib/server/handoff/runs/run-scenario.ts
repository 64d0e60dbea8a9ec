import "server-only";

/**
 * Runs a scenario file for the API through the command-line driver itself (runDriveCommand),
 * so the answer is the command line's output byte for byte and the two can never drift.
 */
import { AppError } from "@/lib/shared/errors";
import {
  runDriveCommand,
  EXIT_BAD_INPUT,
  EXIT_OK,
  type PathRunner,
} from "@/lib/scenario/drive-command";

import { TimeBudgetExceeded } from "./budgeted-runner";
import type { RunRequest } from "./run-request";

/** The name the driver's messages use for the file: the request body. */
const FILE_NAME = "body";

export interface RunOutput {
  /** The output in the driver's own pieces: a 1,000,000-row CSV is never joined into one string. */
  chunks: string[];
  contentType: string;
  warnings: string[];
}

export function runScenario(request: RunRequest, runner: PathRunner): RunOutput {
  let exceeded: TimeBudgetExceeded | null = null;
  const guarded: PathRunner = (params, legs) => {
    try {
      return runner(params, legs);
    } catch (error) {
      if (error instanceof TimeBudgetExceeded) exceeded = error;
      throw error;
    }
  };
  const out: string[] = [];
  const err: string[] = [];
  const argv = [FILE_NAME, `--format=${request.format}`];
  if (request.setId !== null) argv.push(`--set=${request.setId}`);
  const code = runDriveCommand(
    argv,
    {
      readFile: () => JSON.stringify(request.scenario),
      stdout: (text) => void out.push(text),
      stderr: (line) => void err.push(line),
    },
    guarded,
  );
  if (exceeded) {
    throw new AppError(
      "invalid:time-budget",
      `The run exceeded its time budget (${(exceeded as TimeBudgetExceeded).budgetMs / 1000} s of CPU); shorten the path or use the command-line driver.`,
    );
  }
  // Exit 2 is the user's file or choice of set; anything else is a fault of ours (masked 500).
  if (code === EXIT_BAD_INPUT)
    throw new AppError("invalid:file", err[0] ?? "The file is not valid.");
  if (code !== EXIT_OK) throw new Error(err[0] ?? "the driver failed");
  return {
    chunks: out,
    contentType: request.format === "csv" ? "text/csv; charset=utf-8" : "application/json",
    warnings: err.filter((l) => l.startsWith("warning: ")).map((l) => l.slice(9)),
  };
}

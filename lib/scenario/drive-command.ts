/**
 * The command-line driver as a function of its arguments and its I/O, so tests can run it in
 * process. Contract (scenario-file.md): results on stdout only; exit 0 for every run, failed
 * points included; exit 2 with one line on stderr for bad arguments or a bad file.
 */
import { findTooDeep, tooDeepMessage } from "@/lib/shared/json-depth";

import { parseDriveArgs, DRIVE_USAGE } from "./drive-args";
import { runScenarioFile, type PathRunner } from "./run-scenario-file";

export type { PathRunner };

export interface DriveIo {
  /** Reads a file as UTF-8 text; throws a Node file-system error when it cannot. */
  readFile(path: string): string;
  stdout(text: string): void;
  /** One line, without its newline. */
  stderr(line: string): void;
}

const EXIT_OK = 0;
export const EXIT_INTERNAL = 1;
const EXIT_BAD_INPUT = 2;

function describeReadError(file: string, err: unknown): string {
  const code = (err as { code?: string }).code;
  if (code === "ENOENT") return `cannot read ${file}: no such file`;
  if (code === "EISDIR") return `cannot read ${file}: it is a directory`;
  if (code === "EACCES") return `cannot read ${file}: permission denied`;
  return `cannot read ${file}: ${code ?? (err as Error).message ?? String(err)}`;
}

/**
 * JSON.parse sometimes reports a character position (people want a line and column) and
 * sometimes quotes the offending text, newlines included: keep the message on one short line.
 */
function describeJsonError(file: string, text: string, err: unknown): string {
  const raw = err instanceof Error ? err.message : String(err);
  const message = raw.replace(/\s+/g, " ").slice(0, 160);
  const position = /position (\d+)/.exec(raw);
  if (!position) return `${file}: not valid JSON (${message})`;
  const offset = Number(position[1]);
  const before = text.slice(0, offset);
  const line = before.split("\n").length;
  const column = offset - before.lastIndexOf("\n");
  return `${file}: not valid JSON at line ${line}, column ${column} (${message})`;
}

/** Runs the driver; returns the exit code. Never throws. */
export function runDriveCommand(argv: readonly string[], io: DriveIo, run: PathRunner): number {
  const args = parseDriveArgs(argv);
  if (args.kind === "help") {
    io.stdout(DRIVE_USAGE + "\n");
    return EXIT_OK;
  }
  if (args.kind === "error") {
    io.stderr(args.message);
    return EXIT_BAD_INPUT;
  }
  let text: string;
  try {
    text = io.readFile(args.file);
  } catch (err) {
    io.stderr(describeReadError(args.file, err));
    return EXIT_BAD_INPUT;
  }
  const tooDeep = findTooDeep(text);
  if (tooDeep) {
    io.stderr(`${args.file}: ${tooDeepMessage(tooDeep)}`);
    return EXIT_BAD_INPUT;
  }
  let json: unknown;
  try {
    json = JSON.parse(text.replace(/^\uFEFF/, ""));
  } catch (err) {
    io.stderr(describeJsonError(args.file, text, err));
    return EXIT_BAD_INPUT;
  }
  const outcome = runScenarioFile(
    json,
    { setId: args.setId, format: args.format, fileName: args.file },
    run,
    io.stdout,
  );
  if (outcome.kind === "bad-input") {
    io.stderr(outcome.message);
    return EXIT_BAD_INPUT;
  }
  if (outcome.kind === "internal") {
    io.stderr(outcome.message);
    return EXIT_INTERNAL;
  }
  // Notes such as "compression strength exceeded" are not results: stderr, and still exit 0.
  for (const warning of outcome.warnings) io.stderr(`warning: ${warning}`);
  return EXIT_OK;
}

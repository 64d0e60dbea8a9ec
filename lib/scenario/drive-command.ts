/**
 * The command-line driver as a function of its arguments and its I/O, so tests can run it in
 * process. Contract (scenario-file.md): results on stdout only; exit 0 for every run, failed
 * points included; exit 2 with one line on stderr for bad arguments or a bad file.
 */
import type { Leg, MaterialParams, ResultColumns, RunStatus } from "@/lib/mechanics/types";
import { parseDriveArgs, DRIVE_USAGE } from "./drive-args";
import { toMaterialParams } from "./parameter-set-schema";
import { resultsCsvChunks } from "./results-csv";
import { resultsJsonChunks } from "./results-json";
import { parseScenarioFile } from "./scenario-schema";

export type PathRunner = (
  params: MaterialParams,
  legs: Leg[],
) => { rows: number; columns: ResultColumns; status: RunStatus };

export interface DriveIo {
  /** Reads a file as UTF-8 text; throws a Node file-system error when it cannot. */
  readFile(path: string): string;
  stdout(text: string): void;
  /** One line, without its newline. */
  stderr(line: string): void;
}

export const EXIT_OK = 0;
export const EXIT_INTERNAL = 1;
export const EXIT_BAD_INPUT = 2;

/** Keeps the one stderr line readable when a file has many problems. */
const MAX_ERRORS_ON_LINE = 5;

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
export function describeJsonError(file: string, text: string, err: unknown): string {
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

function oneLine(file: string, errors: string[]): string {
  const shown = errors.slice(0, MAX_ERRORS_ON_LINE).join("; ");
  const more = errors.length - MAX_ERRORS_ON_LINE;
  return `${file}: ${shown}${more > 0 ? `; and ${more} more` : ""}`;
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
  let json: unknown;
  try {
    json = JSON.parse(text.replace(/^\uFEFF/, ""));
  } catch (err) {
    io.stderr(describeJsonError(args.file, text, err));
    return EXIT_BAD_INPUT;
  }
  const parsed = parseScenarioFile(json);
  if (!parsed.ok) {
    io.stderr(oneLine(args.file, parsed.errors));
    return EXIT_BAD_INPUT;
  }
  const sets = parsed.scenario.parameterSets;
  const set = args.setId === null ? sets[0] : sets.find((s) => s.id === args.setId);
  if (!set) {
    const known = sets.map((s) => JSON.stringify(s.id)).join(", ");
    io.stderr(
      `--set: no parameter set ${JSON.stringify(args.setId)} in ${args.file} (it has ${known})`,
    );
    return EXIT_BAD_INPUT;
  }
  try {
    const result = run(toMaterialParams(set), parsed.scenario.path.legs);
    const chunks =
      args.format === "csv"
        ? resultsCsvChunks(result.columns, result.rows)
        : resultsJsonChunks(set.id, result.columns, result.rows, result.status);
    for (const chunk of chunks) io.stdout(chunk);
    // Notes such as "compression strength exceeded" are not results: stderr, and still exit 0.
    for (const warning of result.status.warnings) io.stderr(`warning: ${warning}`);
  } catch (err) {
    // A bug in the core, not in the user's file: say so on one line, no stack trace.
    const message = err instanceof Error ? err.message : String(err);
    io.stderr(
      `internal error while running set ${JSON.stringify(set.id)}: ${message.split("\n")[0]}`,
    );
    return EXIT_INTERNAL;
  }
  return EXIT_OK;
}

/**
 * The one run function: a parsed scenario file, a set and a format in, the contract's output out
 * (scenario-file.md). The command line, `POST /api/v1/runs` (in a compute worker) and the tests all
 * call it, so their outputs can never drift; none of them builds argument strings for another.
 */
import type { Leg, MaterialParams, ResultColumns, RunStatus } from "@/lib/mechanics/types";

import { toMaterialParams } from "./parameter-set-schema";
import { resultsCsvChunks } from "./results-csv";
import { resultsJsonChunks } from "./results-json";
import { parseScenarioFile } from "./scenario-schema";

export type PathRunner = (
  params: MaterialParams,
  legs: Leg[],
) => { rows: number; columns: ResultColumns; status: RunStatus };

export type OutputFormat = "csv" | "json";

export interface RunFileOptions {
  /** The set to run; null runs the first. */
  setId: string | null;
  format: OutputFormat;
  /** How messages name the file: its path on the command line, "body" for the API. */
  fileName: string;
}

export type RunFileOutcome =
  | { kind: "ok"; setId: string; warnings: string[] }
  /** The user's file or choice of set: one line that says what and where. */
  | { kind: "bad-input"; message: string }
  /** A fault of ours (the core threw): one line, no stack trace. */
  | { kind: "internal"; message: string };

/** Keeps the one message line readable when a file has many problems. */
const MAX_ERRORS_ON_LINE = 5;

function oneLine(file: string, errors: string[]): string {
  const shown = errors.slice(0, MAX_ERRORS_ON_LINE).join("; ");
  const more = errors.length - MAX_ERRORS_ON_LINE;
  return `${file}: ${shown}${more > 0 ? `; and ${more} more` : ""}`;
}

/**
 * Validates `json` as a scenario file, runs the chosen set and hands the output to `write` in
 * the writer's own pieces (a 1,000,000-row CSV is never joined into one string). Never throws,
 * except what `run` or `write` throw on purpose (a time budget, a closed port).
 */
export function runScenarioFile(
  json: unknown,
  options: RunFileOptions,
  run: PathRunner,
  write: (text: string) => void,
): RunFileOutcome {
  const parsed = parseScenarioFile(json);
  if (!parsed.ok) return { kind: "bad-input", message: oneLine(options.fileName, parsed.errors) };
  const sets = parsed.scenario.parameterSets;
  const set = options.setId === null ? sets[0] : sets.find((s) => s.id === options.setId);
  if (!set) {
    const known = sets.map((s) => JSON.stringify(s.id)).join(", ");
    return {
      kind: "bad-input",
      message: `--set: no parameter set ${JSON.stringify(options.setId)} in ${options.fileName} (it has ${known})`,
    };
  }
  let result: ReturnType<PathRunner>;
  try {
    result = run(toMaterialParams(set), parsed.scenario.path.legs);
  } catch (err) {
    if (isDeliberate(err)) throw err;
    const message = err instanceof Error ? err.message : String(err);
    return {
      kind: "internal",
      message: `internal error while running set ${JSON.stringify(set.id)}: ${message.split("\n")[0]}`,
    };
  }
  const chunks =
    options.format === "csv"
      ? resultsCsvChunks(result.columns, result.rows)
      : resultsJsonChunks(set.id, result.columns, result.rows, result.status);
  for (const chunk of chunks) write(chunk);
  return { kind: "ok", setId: set.id, warnings: [...result.status.warnings] };
}

/** Errors a runner throws to stop a run on purpose carry a `stopsRun` mark; they pass through. */
function isDeliberate(err: unknown): boolean {
  return (
    typeof err === "object" && err !== null && (err as { stopsRun?: unknown }).stopsRun === true
  );
}

import "server-only";

/** One set of a study: the contract's CSV of its run, like `npm run drive -- --set <id>`. */
import type { Leg, RunStatus } from "@/lib/mechanics/types";
import type { PathRunner } from "@/lib/scenario/run-scenario-file";
import { toMaterialParams, type ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { resultsToCsv } from "@/lib/scenario/results-csv";

export function runStudySet(
  legs: Leg[],
  set: ParameterSet,
  runner: PathRunner,
): { csv: string; status: RunStatus } {
  const result = runner(toMaterialParams(set), legs);
  return { csv: resultsToCsv(result.columns, result.rows), status: result.status };
}

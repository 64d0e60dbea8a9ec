import "server-only";

/** Reads, replays and compares one uploaded history: pure, shared by the service and the download. */
import { AppError } from "@/lib/shared/errors";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import type { Scenario } from "@/lib/scenario/scenario-schema";
import { DetailedAppError } from "@/lib/server/workspace/errors";

import { compareHistory } from "./compare";
import { differencesCsv } from "./differences-csv";
import { readHistory } from "./read-history";
import { replayHistory } from "./replay";
import type { ConformanceTolerance } from "./types";
import type { HistoryMapping } from "./upload-schema";

export function runConformance(
  scenario: Scenario,
  setId: string | undefined,
  text: string,
  tolerance: ConformanceTolerance,
  mapping?: HistoryMapping,
) {
  const set = setId
    ? scenario.parameterSets.find((s) => s.id === setId)
    : scenario.parameterSets[0];
  if (!set) {
    throw new AppError(
      "invalid:set",
      `There is no parameter set ${JSON.stringify(setId)} in this revision.`,
      "set",
    );
  }
  const read = readHistory(text, mapping);
  if (!read.ok) {
    const { code, line, column, message } = read.error;
    throw new DetailedAppError(
      code === "too-large" ? "invalid:too-large" : "invalid:csv",
      message,
      { line, column, reason: code },
      "text",
    );
  }
  const replay = replayHistory(toMaterialParams(set), read.history);
  const result = compareHistory(set.id, read.history, replay.columns, replay.rowOf, tolerance);
  return {
    result,
    differences: () => differencesCsv(result, read.history, replay.columns, replay.rowOf),
    curves: { history: read.history, columns: replay.columns, rowOf: replay.rowOf },
  };
}

/** What the compute pool's "conformance" task sends back: everything but the CSV writer. */
export type ConformanceReplay = Omit<ReturnType<typeof runConformance>, "differences">;

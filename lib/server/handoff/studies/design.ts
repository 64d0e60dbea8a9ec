import "server-only";

/**
 * Expands a study request into the parameter sets to run, validated by the scenario file schema
 * (so a grid point outside a parameter's range is reported like a bad file, with its path).
 */
import { AppError } from "@/lib/shared/errors";
import type { Leg } from "@/lib/mechanics/types";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { parseScenarioFileOrThrow } from "@/lib/server/workspace/parse";

import { axisValues, MAX_STUDY_INCREMENTS, MAX_STUDY_SETS, type StudyRequest } from "./schema";

export interface StudyDesign {
  legs: Leg[];
  sets: ParameterSet[];
  design: Record<string, unknown>;
}

function gridSets(
  file: Record<string, unknown>,
  grid: NonNullable<StudyRequest["grid"]>,
): Record<string, unknown>[] {
  const sets = (file.parameterSets ?? []) as Record<string, unknown>[];
  const baseIndex = grid.base ? sets.findIndex((s) => s.id === grid.base) : 0;
  const base = sets[baseIndex];
  if (!base) {
    throw new AppError(
      "invalid:grid",
      `There is no parameter set ${JSON.stringify(grid.base)} in the file.`,
      "grid.base",
    );
  }
  const [first, second] = grid.axes.map(axisValues);
  const size = first.length * (second?.length ?? 1);
  if (size > MAX_STUDY_SETS) {
    throw new AppError(
      "invalid:too-large",
      `The grid has ${size} points; the limit is ${MAX_STUDY_SETS}.`,
      "grid",
    );
  }
  const out: Record<string, unknown>[] = [];
  for (const x of first) {
    for (const y of second ?? [undefined]) {
      const set: Record<string, unknown> = { ...base, [grid.axes[0].parameter]: x };
      if (y !== undefined) set[grid.axes[1].parameter] = y;
      const label = grid.axes.map((a, i) => `${a.parameter}=${i === 0 ? x : y}`).join(", ");
      out.push({ ...set, id: `g${out.length + 1}`, label });
    }
  }
  return out;
}

export function designStudy(request: StudyRequest): StudyDesign {
  const file = request.scenario;
  const rawSets = request.grid ? gridSets(file, request.grid) : (file.parameterSets as unknown);
  if (Array.isArray(rawSets) && rawSets.length > MAX_STUDY_SETS) {
    throw new AppError(
      "invalid:too-large",
      `The study has ${rawSets.length} sets; the limit is ${MAX_STUDY_SETS}.`,
      "scenario.parameterSets",
    );
  }
  const scenario = parseScenarioFileOrThrow({ ...file, parameterSets: rawSets });
  const legs = scenario.path.legs;
  const perSet = legs.reduce((sum, leg) => sum + leg.increments, 0);
  const total = perSet * scenario.parameterSets.length;
  if (total > MAX_STUDY_INCREMENTS) {
    throw new AppError(
      "invalid:too-large",
      `The study has ${total} increments over all sets; the limit is ${MAX_STUDY_INCREMENTS.toLocaleString("en")}.`,
    );
  }
  const design = request.grid ? { kind: "grid", ...request.grid } : { kind: "sets" };
  return { legs, sets: scenario.parameterSets, design };
}

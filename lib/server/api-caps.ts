import "server-only";

import { AppError } from "@/lib/shared/errors";
import { MAX_TOTAL_INCREMENTS } from "@/lib/scenario/path-schema";

/**
 * Caps the API states (README "API", OpenAPI description) and enforces on a scenario file before
 * anything is computed. The UI allows 6 parameter sets; the API allows twice that, so a script may
 * compare more candidates, while the report (one run per set) stays bounded.
 */
export const API_MAX_PARAMETER_SETS = 12;
/** Row 0 is the initial state, then one row per increment of the largest path allowed. */
export const API_MAX_RUN_ROWS = MAX_TOTAL_INCREMENTS + 1;

function totalIncrements(scenario: Record<string, unknown>): number {
  const legs = (scenario.path as { legs?: unknown } | undefined)?.legs;
  if (!Array.isArray(legs)) return 0;
  let total = 0;
  for (const leg of legs) {
    const n = (leg as { increments?: unknown } | null)?.increments;
    if (typeof n === "number" && Number.isFinite(n) && n > 0) total += n;
  }
  return total;
}

/** Throws a 400 naming the cap when the file asks for more; the schema checks the rest. */
export function checkApiCaps(scenario: Record<string, unknown>): void {
  const sets = scenario.parameterSets;
  if (Array.isArray(sets) && sets.length > API_MAX_PARAMETER_SETS) {
    throw new AppError(
      "invalid:cap",
      `The file has ${sets.length} parameter sets; the API accepts at most ${API_MAX_PARAMETER_SETS} per scenario file.`,
      "parameterSets",
    );
  }
  const rows = totalIncrements(scenario) + 1;
  if (rows > API_MAX_RUN_ROWS) {
    throw new AppError(
      "invalid:cap",
      `The run would produce ${rows.toLocaleString("en")} rows; the API answers at most ${API_MAX_RUN_ROWS.toLocaleString("en")} rows per run.`,
      "path.legs",
    );
  }
}

/** The same caps on a `{ file, … }` body that saves a scenario file (create, new revision). */
export function checkApiCapsOfSavedFile(body: unknown): void {
  const file = (body as { file?: unknown } | null)?.file;
  if (typeof file === "object" && file !== null && !Array.isArray(file)) {
    checkApiCaps(file as Record<string, unknown>);
  }
}

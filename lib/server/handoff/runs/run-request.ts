import "server-only";

/**
 * What `POST /api/v1/runs` accepts: either a bare scenario file (set and format in the query
 * string) or `{ scenario, set?, format? }`. The wrapper exists because a scenario file has a
 * `format` field of its own. Without an explicit format the Accept header decides; CSV otherwise.
 */
import { z } from "zod";

import { AppError } from "@/lib/shared/errors";
import { MAX_TOTAL_INCREMENTS } from "@/lib/scenario/path-schema";
import { parseWithPath } from "@/lib/server/workspace/parse";

const runFormatSchema = z.enum(["csv", "json"]);
export type RunFormat = z.infer<typeof runFormatSchema>;

const setIdSchema = z.string().min(1).max(100);

export const runRequestSchema = z.strictObject({
  scenario: z
    .record(z.string(), z.unknown())
    .describe("A scenario file (craquelure.scenario/1), as the command-line driver reads it"),
  set: setIdSchema.optional().describe("Parameter set id; default: the first set"),
  format: runFormatSchema.optional().describe("csv (default) or json"),
});

const runQuerySchema = z.object({
  set: setIdSchema.optional(),
  format: runFormatSchema.optional(),
});

export interface RunRequest {
  scenario: Record<string, unknown>;
  setId: string | null;
  format: RunFormat;
}

function formatFromAccept(accept: string | null): RunFormat | undefined {
  if (!accept) return undefined;
  if (/\btext\/csv\b/.test(accept)) return "csv";
  if (/\bapplication\/json\b/.test(accept)) return "json";
  return undefined;
}

export function readRunRequest(
  body: unknown,
  query: Record<string, string>,
  accept: string | null,
): RunRequest {
  if (typeof body !== "object" || body === null || Array.isArray(body)) {
    throw new AppError("invalid:body", "Send a scenario file, or { scenario, set, format }.");
  }
  const q = parseWithPath(runQuerySchema, query);
  const wrapped = "scenario" in body ? parseWithPath(runRequestSchema, body) : null;
  const scenario = wrapped ? wrapped.scenario : (body as Record<string, unknown>);
  checkIncrementLimit(scenario);
  return {
    scenario,
    setId: wrapped?.set ?? q.set ?? null,
    format: wrapped?.format ?? q.format ?? formatFromAccept(accept) ?? "csv",
  };
}

/** Counted before validation so an oversized path answers 413 without building anything. */
function checkIncrementLimit(scenario: Record<string, unknown>): void {
  const legs = (scenario.path as { legs?: unknown } | undefined)?.legs;
  if (!Array.isArray(legs)) return;
  let total = 0;
  for (const leg of legs) {
    const n = (leg as { increments?: unknown } | null)?.increments;
    if (typeof n === "number" && Number.isFinite(n) && n > 0) total += n;
  }
  if (total > MAX_TOTAL_INCREMENTS) {
    throw new AppError(
      "invalid:too-large",
      `The path has ${total} increments in total; the limit is ${MAX_TOTAL_INCREMENTS.toLocaleString("en")}.`,
      "path.legs",
    );
  }
}

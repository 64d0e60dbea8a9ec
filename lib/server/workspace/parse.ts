import type { z } from "zod";

import { AppError } from "@/lib/shared/errors";
import { parseScenarioFile, type Scenario } from "@/lib/scenario/scenario-schema";
import { formatIssues, formatJsonPath } from "@/lib/scenario/issue-messages";

/**
 * Like parseInput, but the error names the full JSON path of the first problem
 * (`values.E1`) and lists up to five problems, so a client can point at nested fields.
 */
export function parseWithPath<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const first = result.error.issues[0];
  const head = first?.path[0];
  const path = first?.path.length ? formatJsonPath(first.path) : undefined;
  const message = formatIssues(result.error.issues, 5).join("; ");
  throw new AppError(`invalid:${head === undefined ? "input" : String(head)}`, message, path);
}

/** A scenario file as a revision stores it: validated by the scenario module's schema. */
export function parseScenarioFileOrThrow(file: unknown): Scenario {
  if (typeof file !== "object" || file === null || Array.isArray(file)) {
    throw new AppError("invalid:file", "The scenario file must be a JSON object.", "file");
  }
  const result = parseScenarioFile(file);
  if (result.ok) return result.scenario;
  const shown = result.errors.slice(0, 5).join("; ");
  const more = result.errors.length > 5 ? ` (and ${result.errors.length - 5} more)` : "";
  throw new AppError("invalid:file", `The scenario file is not valid: ${shown}${more}`, "file");
}

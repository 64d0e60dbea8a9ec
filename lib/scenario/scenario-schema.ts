/**
 * The scenario file, version 1 (scenario-file.md): one or more parameter sets and one path.
 * `parseScenarioFile` is what the CLI, the API and the import dialog call; it never throws.
 */
import { z } from "zod";
import { formatIssues } from "./issue-messages";
import { parameterSetSchema, type ParameterSet } from "./parameter-set-schema";
import { pathSchema, type Path } from "./path-schema";
import { objectError } from "./schema-helpers";

export const SCENARIO_FORMAT = "craquelure.scenario/1";

/** Default set ids by position: A … Z, then AA, AB, … (spreadsheet-column style). */
export function defaultSetId(index: number): string {
  let id = "";
  for (let n = index + 1; n > 0; n = Math.floor((n - 1) / 26)) {
    id = String.fromCharCode(65 + ((n - 1) % 26)) + id;
  }
  return id;
}

const formatSchema = z.literal(SCENARIO_FORMAT, {
  error: (issue) =>
    issue.input === undefined
      ? `required; this version reads "${SCENARIO_FORMAT}"`
      : `unknown format ${JSON.stringify(issue.input)}; this version reads "${SCENARIO_FORMAT}"`,
});

const parameterSetsSchema = z
  .array(parameterSetSchema, { error: "required (a list of parameter sets)" })
  .min(1, { error: "must contain at least one parameter set" })
  .transform((sets): ParameterSet[] =>
    sets.map((set, index) => ({ ...set, id: set.id ?? defaultSetId(index) })),
  )
  .superRefine((sets, ctx) => {
    const firstIndexOf = new Map<string, number>();
    sets.forEach((set, index) => {
      const earlier = firstIndexOf.get(set.id);
      if (earlier === undefined) {
        firstIndexOf.set(set.id, index);
        return;
      }
      ctx.addIssue({
        code: "custom",
        path: [index, "id"],
        message: `duplicate id ${JSON.stringify(set.id)} (also parameterSets[${earlier}]; ids default to A, B, … by position)`,
        input: set.id,
      });
    });
  });

/** Unknown top-level fields are ignored (room for editor metadata); inside sets and legs they are errors. */
export const scenarioFileSchema = z.object(
  {
    format: formatSchema,
    name: z
      .string({ error: "must be a string" })
      .max(500, { error: "must be at most 500 characters" })
      .default(""),
    parameterSets: parameterSetsSchema,
    path: pathSchema,
  },
  objectError("a JSON object"),
);

export interface Scenario {
  format: typeof SCENARIO_FORMAT;
  name: string;
  parameterSets: ParameterSet[];
  path: Path;
}

export type ParseResult = { ok: true; scenario: Scenario } | { ok: false; errors: string[] };

/** Validates a parsed JSON value. Errors read `<json path>: <message>`. */
export function parseScenarioFile(json: unknown): ParseResult {
  // A different format may mean different fields: say only that, not a cascade of other errors.
  if (typeof json === "object" && json !== null && !Array.isArray(json)) {
    const format = formatSchema.safeParse((json as Record<string, unknown>).format);
    if (!format.success)
      return { ok: false, errors: formatIssues(prefix(format.error.issues, "format")) };
  }
  const result = scenarioFileSchema.safeParse(json);
  if (result.success) return { ok: true, scenario: result.data };
  return { ok: false, errors: formatIssues(result.error.issues) };
}

function prefix(issues: z.core.$ZodIssue[], key: string): z.core.$ZodIssue[] {
  return issues.map((issue) => ({ ...issue, path: [key, ...issue.path] }));
}

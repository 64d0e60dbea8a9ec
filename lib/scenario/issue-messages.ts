/**
 * Turns zod issues into the messages of the scenario contract: "<json path>: <message>",
 * e.g. `parameterSets[0].a1: must be > 0 and a1·sqrt(Y0_1) < 1`.
 */
import type { z } from "zod";

/** `["parameterSets", 0, "a1"]` → `parameterSets[0].a1`; the empty path is the whole file. */
export function formatJsonPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const segment of path) {
    if (typeof segment === "number") out += `[${segment}]`;
    else out += out === "" ? String(segment) : `.${String(segment)}`;
  }
  return out === "" ? "(file)" : out;
}

/** One line per problem; unknown keys get one line each so every line names its field. */
export function formatIssues(issues: readonly z.core.$ZodIssue[], maxLines = 50): string[] {
  const lines: string[] = [];
  for (const issue of issues) {
    if (issue.code === "unrecognized_keys") {
      for (const key of issue.keys)
        lines.push(`${formatJsonPath([...issue.path, key])}: unknown field`);
    } else {
      lines.push(`${formatJsonPath(issue.path)}: ${issue.message}`);
    }
  }
  if (lines.length > maxLines) {
    const rest = lines.length - maxLines;
    return [...lines.slice(0, maxLines), `… and ${rest} more problem${rest === 1 ? "" : "s"}`];
  }
  return lines;
}

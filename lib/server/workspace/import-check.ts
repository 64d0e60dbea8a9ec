import "server-only";

import { AppError } from "@/lib/shared/errors";
import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";

import type { TeamExport } from "./export-schema";

function invalid(where: string, message: string): never {
  throw new AppError("invalid:import", `${where}: ${message}`, where);
}

/** A set's versions: numbers unique, each version's values valid for the scenario module. */
function checkSetVersions(set: TeamExport["parameterSets"][number], where: string) {
  const numbers = new Set<number>();
  (set.versions ?? []).forEach((v, j) => {
    const at = `${where}.versions[${j}]`;
    if (numbers.has(v.version)) invalid(at, `version ${v.version} twice`);
    numbers.add(v.version);
    const parsed = parameterSetSchema.safeParse(v.values);
    if (!parsed.success) invalid(`${at}.values`, parsed.error.issues[0]?.message ?? "invalid");
  });
}

/**
 * Checks what the zod shape cannot: every scenario file and parameter set passes the
 * scenario module's schema, revision numbers are unique per scenario, set names are unique,
 * and every reply's parent is a comment of the same revision. Nothing is written before this.
 */
export function checkTeamExport(doc: TeamExport): void {
  const names = new Set<string>();
  doc.parameterSets.forEach((set, i) => {
    const where = `parameterSets[${i}]`;
    if (names.has(set.name)) invalid(where, `a second parameter set named "${set.name}"`);
    names.add(set.name);
    const parsed = parameterSetSchema.safeParse(set.values);
    if (!parsed.success) invalid(`${where}.values`, parsed.error.issues[0]?.message ?? "invalid");
    checkSetVersions(set, where);
  });
  doc.scenarios.forEach((scenario, i) => {
    const numbers = new Set<number>();
    scenario.revisions.forEach((revision, j) => {
      const where = `scenarios[${i}].revisions[${j}]`;
      if (numbers.has(revision.number)) invalid(where, `revision ${revision.number} twice`);
      numbers.add(revision.number);
      const file = parseScenarioFile(revision.file);
      if (!file.ok) invalid(`${where}.file`, file.errors.slice(0, 3).join("; "));
      const keys = new Set(revision.comments.map((c) => c.key));
      if (keys.size !== revision.comments.length) invalid(where, "two comments share a key");
      revision.comments.forEach((comment, k) => {
        if (comment.parentKey !== null && !keys.has(comment.parentKey)) {
          invalid(`${where}.comments[${k}]`, "replies to a comment that is not in this revision");
        }
      });
    });
  });
}

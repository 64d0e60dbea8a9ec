import type { z } from "zod";

import { parameterSetSchema } from "@/lib/scenario/parameter-set-schema";
import { parseScenarioFile } from "@/lib/scenario/scenario-schema";
import { teamImportNotes } from "@/lib/shared/team-import-notes";
import { type TeamExport, teamExportSchema } from "@/lib/shared/validations/team-export";

import { describePlace, type PlaceDoc } from "./team-import-places";

// What a team export will create, read in the browser before anything is sent: the same zod
// shape the server checks, plus the checks the server makes after it (scenario files, set
// values, revision numbers, set names, replies), each said in words a person can act on.

export interface ScenarioLine {
  name: string;
  revisions: number;
  comments: number;
  /** Revisions whose review state is other than draft. */
  reviews: number;
}

export interface TeamImportCounts {
  scenarios: number;
  revisions: number;
  parameterSets: number;
  comments: number;
  /** Revisions carrying a review (requested, approved, changes asked). */
  reviews: number;
  /** Entries of review history (who moved a revision from which state to which). */
  reviewEvents: number;
  /** Test records, each with its original file. */
  testRecords: number;
  fits: number;
}

export type TeamImportSummary =
  | {
      ok: true;
      doc: TeamExport;
      from: { name: string; slug: string; exportedAt: string };
      counts: TeamImportCounts;
      scenarios: ScenarioLine[];
      parameterSets: string[];
      testRecords: string[];
      /** What the import will leave out (overlays of records not in the file, …). */
      notes: string[];
    }
  | { ok: false; problems: string[] };

/** Problems shown at most; the rest are counted. */
export const MAX_PROBLEMS = 12;

function capped(problems: string[]): string[] {
  if (problems.length <= MAX_PROBLEMS) return problems;
  const rest = problems.length - MAX_PROBLEMS;
  return [
    ...problems.slice(0, MAX_PROBLEMS),
    `… and ${rest} more problem${rest === 1 ? "" : "s"}.`,
  ];
}

function valueAt(doc: unknown, path: readonly PropertyKey[]): unknown {
  let at: unknown = doc;
  for (const key of path) {
    if (typeof at !== "object" || at === null) return undefined;
    at = (at as Record<PropertyKey, unknown>)[key];
  }
  return at;
}

function sentence(text: string): string {
  const t = text.trim();
  const capital = t.charAt(0).toUpperCase() + t.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

const KIND_WORDS: Record<string, string> = {
  string: "text",
  number: "a number",
  int: "a whole number",
  boolean: "true or false",
  array: "a list",
  object: "a group of fields",
  record: "a group of fields",
  null: "empty",
};

/** Bounds in words: "should be at least 0", "needs at least 1 entry". */
function limitWords(issue: z.core.$ZodIssue): string | null {
  if (issue.code !== "too_small" && issue.code !== "too_big") return null;
  const small = issue.code === "too_small";
  const bound = Number(small ? issue.minimum : issue.maximum);
  if (issue.origin === "number" || issue.origin === "int") {
    return `should be ${small ? "at least" : "at most"} ${bound}`;
  }
  if (issue.origin === "string") {
    if (small && bound <= 1) return "cannot be empty";
    return small ? `needs at least ${bound} characters` : `should be at most ${bound} characters`;
  }
  if (issue.origin === "array") {
    const entries = `${bound} ${bound === 1 ? "entry" : "entries"}`;
    return small ? `needs at least ${entries}` : `should have at most ${entries}`;
  }
  return null;
}

/** One zod issue of the export shape in words: "revision 3 of 'Plate rib' has no scenario file". */
function shapeProblem(issue: z.core.$ZodIssue, input: unknown): string {
  if (issue.path.length === 1 && issue.path[0] === "format") return issue.message;
  const place = describePlace(issue.path, input as PlaceDoc);
  if (issue.code === "invalid_type" && valueAt(input, issue.path) === undefined) {
    return sentence(`${place.where} has no ${place.field}`);
  }
  if (issue.code === "unrecognized_keys") {
    return sentence(
      `${place.where} has fields this version does not know: ${issue.keys.join(", ")}`,
    );
  }
  if (issue.code === "invalid_type") {
    const kind = KIND_WORDS[issue.expected] ?? `of type ${issue.expected}`;
    return sentence(`${place.where}: the ${place.field || "entry"} should be ${kind}`);
  }
  const limit = limitWords(issue);
  if (limit) return sentence(`${place.where}: the ${place.field || "entry"} ${limit}`);
  const what = place.field ? `${place.where}, ${place.field}` : place.where;
  return sentence(`${what}: ${issue.message}`);
}

/** What the server checks after the shape, in words; empty when the file will import. */
function contentProblems(doc: TeamExport): string[] {
  const problems: string[] = [];
  const names = new Set<string>();
  for (const set of doc.parameterSets) {
    if (names.has(set.name)) problems.push(`Two parameter sets are named '${set.name}'.`);
    names.add(set.name);
    const values = parameterSetSchema.safeParse(set.values);
    if (!values.success) {
      const first = values.error.issues[0];
      const field = first?.path.length ? `${first.path.join(".")}: ` : "";
      problems.push(
        `Parameter set '${set.name}' has values that are not valid (${field}${first?.message}).`,
      );
    }
  }
  for (const scenario of doc.scenarios) {
    const numbers = new Set<number>();
    for (const revision of scenario.revisions) {
      const where = `revision ${revision.number} of '${scenario.name}'`;
      if (numbers.has(revision.number)) problems.push(sentence(`${where} appears twice`));
      numbers.add(revision.number);
      const file = parseScenarioFile(revision.file);
      if (!file.ok) {
        const more = file.errors.length > 1 ? ` and ${file.errors.length - 1} more` : "";
        problems.push(
          sentence(`${where} has a scenario file that is not valid (${file.errors[0]}${more})`),
        );
      }
      const keys = new Set(revision.comments.map((c) => c.key));
      if (keys.size !== revision.comments.length) {
        problems.push(sentence(`two comments on ${where} carry the same key`));
      }
      revision.comments.forEach((comment, k) => {
        if (comment.parentKey !== null && !keys.has(comment.parentKey)) {
          problems.push(
            sentence(`comment ${k + 1} on ${where} replies to a comment that is not in the file`),
          );
        }
      });
    }
  }
  const keys = new Set<string>();
  for (const record of doc.testRecords) {
    const key = record.key.toLowerCase();
    if (keys.has(key)) problems.push(`Test record '${record.name}' appears twice in the file.`);
    keys.add(key);
  }
  doc.fits.forEach((fit, i) => {
    const values = parameterSetSchema.safeParse(fit.params);
    if (!values.success) {
      const first = values.error.issues[0];
      const field = first?.path.length ? `${first.path.join(".")}: ` : "";
      problems.push(`Fit ${i + 1} has values that are not valid (${field}${first?.message}).`);
    }
  });
  return problems;
}

function countScenario(s: TeamExport["scenarios"][number]): ScenarioLine {
  return {
    name: s.name,
    revisions: s.revisions.length,
    comments: s.revisions.reduce((n, r) => n + r.comments.length, 0),
    reviews: s.revisions.filter((r) => r.review.state !== "draft").length,
  };
}

/** Summary of a parsed team export: what will be created, or every problem found. */
export function summarizeTeamExport(input: unknown): TeamImportSummary {
  const shape = teamExportSchema.safeParse(input);
  if (!shape.success) {
    const formatIssue = shape.error.issues.find(
      (i) => i.path.length === 1 && i.path[0] === "format",
    );
    // Another kind of file: say only that, not a cascade of missing fields.
    if (formatIssue) return { ok: false, problems: [formatIssue.message] };
    return { ok: false, problems: capped(shape.error.issues.map((i) => shapeProblem(i, input))) };
  }
  const doc = shape.data;
  const problems = contentProblems(doc);
  if (problems.length > 0) return { ok: false, problems: capped(problems) };
  const scenarios = doc.scenarios.map(countScenario);
  const sum = (pick: (s: ScenarioLine) => number) => scenarios.reduce((n, s) => n + pick(s), 0);
  return {
    ok: true,
    doc,
    from: { name: doc.team.name, slug: doc.team.slug, exportedAt: doc.exportedAt },
    counts: {
      scenarios: scenarios.length,
      revisions: sum((s) => s.revisions),
      parameterSets: doc.parameterSets.length,
      comments: sum((s) => s.comments),
      reviews: sum((s) => s.reviews),
      reviewEvents: doc.scenarios.reduce(
        (n, s) => n + s.revisions.reduce((m, r) => m + r.reviewEvents.length, 0),
        0,
      ),
      testRecords: doc.testRecords.length,
      fits: doc.fits.length,
    },
    scenarios,
    parameterSets: doc.parameterSets.map((p) => p.name),
    testRecords: doc.testRecords.map((r) => r.name),
    notes: teamImportNotes(doc),
  };
}

/** The text of a chosen file: JSON first, then the summary. */
export function summarizeTeamExportText(text: string): TeamImportSummary {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    return {
      ok: false,
      problems: ["The file is not JSON; choose the file the team export downloaded."],
    };
  }
  if (typeof parsed !== "object" || parsed === null || Array.isArray(parsed)) {
    return { ok: false, problems: ["The file holds no team export (it is not a JSON object)."] };
  }
  return summarizeTeamExport(parsed);
}

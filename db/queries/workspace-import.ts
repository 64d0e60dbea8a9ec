import { count, eq } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { revisionComments } from "@/db/schema/comments";
import { parameterSets, parameterSetVersions } from "@/db/schema/parameter-sets";
import { reviewEvents, scenarioRevisions, scenarios } from "@/db/schema/scenarios";

import type { NewComment } from "./comments";
import type { NewParameterSet, NewParameterSetVersion } from "./parameter-sets";
import type { NewRevision } from "./revisions";
import type { NewReviewEvent } from "./reviews";
import type { NewScenario } from "./scenarios";

// The writes of a team import. The caller runs them in one transaction: all of it or nothing.

/** How many scenarios and parameter sets the team holds (an import needs an empty team). */
export async function countTeamContent(db: Executor, teamId: string) {
  const [[s], [p]] = await Promise.all([
    db.select({ n: count() }).from(scenarios).where(eq(scenarios.teamId, teamId)),
    db.select({ n: count() }).from(parameterSets).where(eq(parameterSets.teamId, teamId)),
  ]);
  return { scenarios: s.n, parameterSets: p.n };
}

// Rows per INSERT: keeps each statement well under PostgreSQL's limit of bind parameters.
const CHUNK = 500;

async function insertChunked<T>(rows: T[], insert: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += CHUNK) await insert(rows.slice(i, i + CHUNK));
}

export interface ImportedRows {
  parameterSets: NewParameterSet[];
  /** Each imported set's versions (at least its version 1). */
  parameterSetVersions: NewParameterSetVersion[];
  scenarios: NewScenario[];
  revisions: NewRevision[];
  reviewEvents: NewReviewEvent[];
  /** In creation order, so a parent is inserted before its replies. */
  comments: NewComment[];
}

/** Inserts in the order the foreign keys need: parents before the rows that point at them. */
export async function insertImportedRows(db: Executor, rows: ImportedRows) {
  await insertChunked(rows.parameterSets, (chunk) => db.insert(parameterSets).values(chunk));
  await insertChunked(rows.parameterSetVersions, (chunk) =>
    db.insert(parameterSetVersions).values(chunk),
  );
  await insertChunked(rows.scenarios, (chunk) => db.insert(scenarios).values(chunk));
  await insertChunked(rows.revisions, (chunk) => db.insert(scenarioRevisions).values(chunk));
  await insertChunked(rows.reviewEvents, (chunk) => db.insert(reviewEvents).values(chunk));
  await insertChunked(rows.comments, (chunk) => db.insert(revisionComments).values(chunk));
}

import { and, asc, eq, inArray } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { revisionComments } from "@/db/schema/comments";
import { fits } from "@/db/schema/fits";
import { parameterSets } from "@/db/schema/parameter-sets";
import { reviewEvents, scenarioRevisions, scenarios } from "@/db/schema/scenarios";
import { memberships } from "@/db/schema/teams";
import { testRecords } from "@/db/schema/test-records";
import { users } from "@/db/schema/users";

/** Every row a team export needs, in stable order. */
export async function loadTeamContent(db: Executor, teamId: string) {
  const scenarioRows = await db
    .select()
    .from(scenarios)
    .where(eq(scenarios.teamId, teamId))
    .orderBy(asc(scenarios.createdAt), asc(scenarios.id));
  const ids = scenarioRows.map((s) => s.id);
  const revisionRows = ids.length
    ? await db
        .select()
        .from(scenarioRevisions)
        .where(inArray(scenarioRevisions.scenarioId, ids))
        .orderBy(asc(scenarioRevisions.number))
    : [];
  const revisionIds = revisionRows.map((r) => r.id);
  const [eventRows, commentRows, setRows] = await Promise.all([
    revisionIds.length
      ? db
          .select()
          .from(reviewEvents)
          .where(inArray(reviewEvents.revisionId, revisionIds))
          .orderBy(asc(reviewEvents.at), asc(reviewEvents.id))
      : [],
    revisionIds.length
      ? db
          .select()
          .from(revisionComments)
          .where(inArray(revisionComments.revisionId, revisionIds))
          .orderBy(asc(revisionComments.createdAt), asc(revisionComments.id))
      : [],
    db
      .select()
      .from(parameterSets)
      .where(eq(parameterSets.teamId, teamId))
      .orderBy(asc(parameterSets.name)),
  ]);
  return { scenarioRows, revisionRows, eventRows, commentRows, setRows };
}

/**
 * The team's test records (with points and the original file) and its fits, oldest first, each
 * fit with the name of the parameter set it was saved as (the export names sets by name).
 */
export async function loadTeamRecordsAndFits(db: Executor, teamId: string) {
  const [recordRows, fitRows] = await Promise.all([
    db
      .select()
      .from(testRecords)
      .where(eq(testRecords.teamId, teamId))
      .orderBy(asc(testRecords.createdAt), asc(testRecords.id)),
    db
      .select({ fit: fits, parameterSetName: parameterSets.name })
      .from(fits)
      .leftJoin(parameterSets, eq(parameterSets.id, fits.parameterSetId))
      .where(eq(fits.teamId, teamId))
      .orderBy(asc(fits.createdAt), asc(fits.id)),
  ]);
  return { recordRows, fitRows };
}

/** E-mail and name of the given users, for turning author ids into portable people. */
export async function loadPeople(db: Executor, ids: string[]) {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map<string, { email: string; name: string }>();
  const rows = await db
    .select({ id: users.id, email: users.email, name: users.name })
    .from(users)
    .where(inArray(users.id, unique));
  return new Map(rows.map((r) => [r.id, { email: r.email, name: r.name }]));
}

/**
 * User ids for the given e-mail addresses, among the current members of one team only. An
 * import may name anyone; matching outside the team would let a file claim work by strangers
 * and would tell the importer which addresses have an account here.
 */
export async function findTeamMembersByEmail(db: Executor, teamId: string, emails: string[]) {
  const unique = [...new Set(emails.map((e) => e.toLowerCase()))];
  if (unique.length === 0) return new Map<string, string>();
  const rows = await db
    .select({ id: users.id, email: users.email })
    .from(users)
    .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.teamId, teamId)))
    .where(inArray(users.email, unique));
  return new Map(rows.map((r) => [r.email, r.id]));
}

import { and, asc, desc, eq, inArray, sql, type SQL } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { conformanceChecks, type ConformanceCheckRow } from "@/db/schema/conformance-checks";
import { scenarioRevisions, scenarios } from "@/db/schema/scenarios";
import { users } from "@/db/schema/users";
import { largestDeviation, type ConformanceVerdict } from "@/lib/shared/conformance-verdict";

export async function insertConformanceCheck(
  db: Executor,
  values: typeof conformanceChecks.$inferInsert,
): Promise<ConformanceCheckRow> {
  const [row] = await db.insert(conformanceChecks).values(values).returning();
  return row;
}

/** Newest first, without the uploaded file (it can be large). */
export async function listConformanceChecksOfRevision(db: Executor, revisionId: string) {
  return db
    .select({
      id: conformanceChecks.id,
      setId: conformanceChecks.setId,
      fileName: conformanceChecks.fileName,
      passed: conformanceChecks.passed,
      firstFailIncrement: conformanceChecks.firstFailIncrement,
      result: conformanceChecks.result,
      createdAt: conformanceChecks.createdAt,
      author: users.name,
    })
    .from(conformanceChecks)
    .leftJoin(users, eq(users.id, conformanceChecks.createdBy))
    .where(eq(conformanceChecks.revisionId, revisionId))
    .orderBy(desc(conformanceChecks.createdAt));
}

export async function findConformanceCheck(
  db: Executor,
  revisionId: string,
  checkId: string,
): Promise<ConformanceCheckRow | null> {
  const [row] = await db
    .select()
    .from(conformanceChecks)
    .where(and(eq(conformanceChecks.id, checkId), eq(conformanceChecks.revisionId, revisionId)));
  return row ?? null;
}

/** The newest check of one revision of a team's scenario, as a verdict; null when none. */
export async function findLatestConformanceVerdict(
  db: Executor,
  teamId: string,
  scenarioId: string,
  number: number,
): Promise<ConformanceVerdict | null> {
  const [row] = await db
    .select({
      passed: conformanceChecks.passed,
      createdAt: conformanceChecks.createdAt,
      fileName: conformanceChecks.fileName,
      firstFailIncrement: conformanceChecks.firstFailIncrement,
      result: conformanceChecks.result,
    })
    .from(conformanceChecks)
    .innerJoin(scenarioRevisions, eq(scenarioRevisions.id, conformanceChecks.revisionId))
    .where(
      and(
        eq(conformanceChecks.teamId, teamId),
        eq(scenarioRevisions.scenarioId, scenarioId),
        eq(scenarioRevisions.number, number),
      ),
    )
    .orderBy(desc(conformanceChecks.createdAt), desc(conformanceChecks.id))
    .limit(1);
  if (!row) return null;
  return {
    passed: row.passed,
    checkedAt: row.createdAt.toISOString(),
    fileName: row.fileName,
    firstFailIncrement: row.firstFailIncrement,
    largest: largestDeviation(row.result.quantities),
  };
}

export interface LatestRevisionVerdict {
  passed: boolean;
  checkedAt: string;
}

/**
 * The same verdict as a column of a query over `scenarios` (correlated on the outer row), so a
 * page of the list needs no query of its own for it. `checkedAt` comes out as ISO text in UTC
 * with milliseconds, as Date#toISOString writes it.
 */
export function latestVerdictOfLatestRevision(teamId: string): SQL<LatestRevisionVerdict | null> {
  return sql<LatestRevisionVerdict | null>`(
    select json_build_object(
      'passed', c.passed,
      'checkedAt', to_char(c.created_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'))
    from ${conformanceChecks} c
    join ${scenarioRevisions} r on r.id = c.revision_id
    where r.scenario_id = ${scenarios.id} and r.number = ${scenarios.latestRevision}
      and c.team_id = ${teamId}
    order by c.created_at desc, c.id desc
    limit 1)`;
}

/**
 * For each of a team's scenarios, the newest check of its latest revision (the scenarios
 * table's column), in one query for the whole page; scenarios without one are absent.
 */
export async function listLatestVerdictsOfLatestRevisions(
  db: Executor,
  teamId: string,
  scenarioIds: readonly string[],
): Promise<Map<string, LatestRevisionVerdict>> {
  if (scenarioIds.length === 0) return new Map();
  const rows = await db
    .selectDistinctOn([scenarios.id], {
      scenarioId: scenarios.id,
      passed: conformanceChecks.passed,
      createdAt: conformanceChecks.createdAt,
    })
    .from(conformanceChecks)
    .innerJoin(scenarioRevisions, eq(scenarioRevisions.id, conformanceChecks.revisionId))
    .innerJoin(
      scenarios,
      and(
        eq(scenarios.id, scenarioRevisions.scenarioId),
        eq(scenarios.latestRevision, scenarioRevisions.number),
      ),
    )
    .where(
      and(
        eq(scenarios.teamId, teamId),
        eq(conformanceChecks.teamId, teamId),
        inArray(scenarios.id, [...scenarioIds]),
      ),
    )
    .orderBy(asc(scenarios.id), desc(conformanceChecks.createdAt), desc(conformanceChecks.id));
  return new Map(
    rows.map((r) => [r.scenarioId, { passed: r.passed, checkedAt: r.createdAt.toISOString() }]),
  );
}

import "server-only";

import type { Db } from "@/db/client";
import {
  findTestRecordFile,
  findTestRecordPoints,
  findTestRecordSummary,
  listTestRecordsForTeam,
  type TestRecordSummary,
} from "@/db/queries/test-records";
import type { StoredPoints } from "@/db/schema/test-records";
import type { Actor } from "@/lib/server/accounts/actor";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { notFound, requireUuid } from "@/lib/server/workspace/errors";

export type TestRecordListResponse = { items: TestRecordSummary[] };
export type TestRecordResponse = TestRecordSummary & { points: StoredPoints };

export async function listTestRecords(db: Db, actor: Actor, teamSlug: string) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  return { items: await listTestRecordsForTeam(db, ctx.team.id) };
}

/** Summary and parsed points; another team's id is simply not found. */
export async function getTestRecord(
  db: Db,
  actor: Actor,
  teamSlug: string,
  id: unknown,
): Promise<TestRecordResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const recordId = requireUuid(id, "test-record");
  const summary = await findTestRecordSummary(db, ctx.team.id, recordId);
  const points = summary && (await findTestRecordPoints(db, ctx.team.id, recordId));
  if (!summary || !points) throw notFound("test-record");
  return { ...summary, points };
}

/** The original file as uploaded, for download (export capability: every role has it). */
export async function getTestRecordFile(db: Db, actor: Actor, teamSlug: string, id: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "export");
  const file = await findTestRecordFile(db, ctx.team.id, requireUuid(id, "test-record"));
  if (!file) throw notFound("test-record");
  return file;
}

import { and, desc, eq, inArray } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { testRecords } from "@/db/schema/test-records";
import { users } from "@/db/schema/users";

import { personRef } from "./users-view";

type NewTestRecord = typeof testRecords.$inferInsert;

/** Everything a table row or a detail header shows: no points, no file. */
const SUMMARY = {
  id: testRecords.id,
  name: testRecords.name,
  testType: testRecords.testType,
  loading: testRecords.loading,
  specimenId: testRecords.specimenId,
  orientation: testRecords.orientation,
  strainRate: testRecords.strainRate,
  temperature: testRecords.temperature,
  laboratory: testRecords.laboratory,
  notes: testRecords.notes,
  couponOrientation: testRecords.couponOrientation,
  mapping: testRecords.mapping,
  headers: testRecords.headers,
  warnings: testRecords.warnings,
  pointCount: testRecords.pointCount,
  fileName: testRecords.fileName,
  fileSize: testRecords.fileSize,
  fileSha256: testRecords.fileSha256,
  createdBy: personRef(users.id, users.name),
  createdAt: testRecords.createdAt,
};

function summaryQuery(db: Executor) {
  return db.select(SUMMARY).from(testRecords).leftJoin(users, eq(users.id, testRecords.createdBy));
}

type SummaryRow = Awaited<ReturnType<ReturnType<typeof summaryQuery>["execute"]>>[number];

function toSummary(row: SummaryRow) {
  return { ...row, createdAt: row.createdAt.toISOString() };
}
export type TestRecordSummary = ReturnType<typeof toSummary>;

export async function insertTestRecord(db: Executor, values: NewTestRecord): Promise<string> {
  const [row] = await db.insert(testRecords).values(values).returning({ id: testRecords.id });
  return row.id;
}

export async function listTestRecordsForTeam(db: Executor, teamId: string) {
  const rows = await summaryQuery(db)
    .where(eq(testRecords.teamId, teamId))
    .orderBy(desc(testRecords.createdAt));
  return rows.map(toSummary);
}

export async function findTestRecordSummary(db: Executor, teamId: string, id: string) {
  const [row] = await summaryQuery(db).where(
    and(eq(testRecords.teamId, teamId), eq(testRecords.id, id)),
  );
  return row ? toSummary(row) : null;
}

export async function findTestRecordPoints(db: Executor, teamId: string, id: string) {
  const [row] = await db
    .select({ points: testRecords.points })
    .from(testRecords)
    .where(and(eq(testRecords.teamId, teamId), eq(testRecords.id, id)));
  return row?.points ?? null;
}

export async function findTestRecordFile(db: Executor, teamId: string, id: string) {
  const [row] = await db
    .select({
      fileName: testRecords.fileName,
      fileText: testRecords.fileText,
      fileSha256: testRecords.fileSha256,
    })
    .from(testRecords)
    .where(and(eq(testRecords.teamId, teamId), eq(testRecords.id, id)));
  return row ?? null;
}

/** The records a fit uses, with their points; ids of other teams are simply absent. */
export async function findRecordsForFit(db: Executor, teamId: string, ids: string[]) {
  if (ids.length === 0) return [];
  return db
    .select({
      id: testRecords.id,
      name: testRecords.name,
      testType: testRecords.testType,
      orientation: testRecords.orientation,
      couponOrientation: testRecords.couponOrientation,
      points: testRecords.points,
    })
    .from(testRecords)
    .where(and(eq(testRecords.teamId, teamId), inArray(testRecords.id, ids)));
}

/** The id of the team's record under this name, if there is one. */
export async function findTestRecordIdByName(db: Executor, teamId: string, name: string) {
  const [row] = await db
    .select({ id: testRecords.id })
    .from(testRecords)
    .where(and(eq(testRecords.teamId, teamId), eq(testRecords.name, name)));
  return row;
}

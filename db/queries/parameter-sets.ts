import { and, asc, eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";

import type { Executor } from "@/db/client";
import { parameterSets, parameterSetVersions } from "@/db/schema/parameter-sets";
import { users } from "@/db/schema/users";

import { personRef } from "./users-view";

const creator = alias(users, "creator");
const updater = alias(users, "updater");

function viewQuery(db: Executor) {
  return db
    .select({
      id: parameterSets.id,
      name: parameterSets.name,
      values: parameterSets.values,
      provenance: parameterSets.provenance,
      version: parameterSets.version,
      createdBy: personRef(creator.id, creator.name),
      updatedBy: personRef(updater.id, updater.name),
      createdAt: parameterSets.createdAt,
      updatedAt: parameterSets.updatedAt,
    })
    .from(parameterSets)
    .leftJoin(creator, eq(creator.id, parameterSets.createdBy))
    .leftJoin(updater, eq(updater.id, parameterSets.updatedBy));
}

type ViewRow = Awaited<ReturnType<ReturnType<typeof viewQuery>["execute"]>>[number];

function toView(row: ViewRow) {
  return { ...row, createdAt: row.createdAt.toISOString(), updatedAt: row.updatedAt.toISOString() };
}
export type ParameterSetView = ReturnType<typeof toView>;

export async function listParameterSetsForTeam(db: Executor, teamId: string) {
  const rows = await viewQuery(db)
    .where(eq(parameterSets.teamId, teamId))
    .orderBy(asc(parameterSets.name));
  return rows.map(toView);
}

export async function findParameterSetView(db: Executor, teamId: string, id: string) {
  const [row] = await viewQuery(db).where(
    and(eq(parameterSets.teamId, teamId), eq(parameterSets.id, id)),
  );
  return row ? toView(row) : null;
}

export type NewParameterSet = typeof parameterSets.$inferInsert;

/** Inserts the set and its version 1; call inside a transaction. */
export async function insertParameterSet(db: Executor, values: NewParameterSet) {
  const [row] = await db
    .insert(parameterSets)
    .values({ ...values, version: 1 })
    .returning({ id: parameterSets.id, provenance: parameterSets.provenance });
  await insertParameterSetVersion(db, {
    setId: row.id,
    version: 1,
    values: values.values,
    provenance: row.provenance,
    createdBy: values.createdBy ?? null,
  });
  return { id: row.id };
}

export type NewParameterSetVersion = typeof parameterSetVersions.$inferInsert;

export async function insertParameterSetVersion(db: Executor, values: NewParameterSetVersion) {
  await db.insert(parameterSetVersions).values(values);
}

/**
 * Raises the set's version by one and returns the new number; the row lock this takes keeps two
 * concurrent edits from claiming the same number. Call inside the edit's transaction.
 */
export async function bumpParameterSetVersion(db: Executor, teamId: string, id: string) {
  const [row] = await db
    .update(parameterSets)
    .set({ version: sql`${parameterSets.version} + 1` })
    .where(and(eq(parameterSets.teamId, teamId), eq(parameterSets.id, id)))
    .returning({ version: parameterSets.version });
  return row?.version;
}

const versionAuthor = alias(users, "version_author");

/** Every version of one set of the team (or of all its sets), oldest first. */
export async function listParameterSetVersionRows(db: Executor, teamId: string, setId?: string) {
  const rows = await db
    .select({
      setId: parameterSetVersions.setId,
      version: parameterSetVersions.version,
      values: parameterSetVersions.values,
      provenance: parameterSetVersions.provenance,
      createdBy: personRef(versionAuthor.id, versionAuthor.name),
      createdAt: parameterSetVersions.createdAt,
    })
    .from(parameterSetVersions)
    .innerJoin(parameterSets, eq(parameterSets.id, parameterSetVersions.setId))
    .leftJoin(versionAuthor, eq(versionAuthor.id, parameterSetVersions.createdBy))
    .where(
      setId
        ? and(eq(parameterSets.teamId, teamId), eq(parameterSetVersions.setId, setId))
        : eq(parameterSets.teamId, teamId),
    )
    .orderBy(asc(parameterSetVersions.setId), asc(parameterSetVersions.version));
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}
export type ParameterSetVersionView = Awaited<
  ReturnType<typeof listParameterSetVersionRows>
>[number];

export type ParameterSetChanges = Partial<
  Pick<NewParameterSet, "name" | "values" | "provenance">
> & { updatedBy: string; updatedAt: Date };

export async function updateParameterSetRow(
  db: Executor,
  teamId: string,
  id: string,
  changes: ParameterSetChanges,
) {
  await db
    .update(parameterSets)
    .set(changes)
    .where(and(eq(parameterSets.teamId, teamId), eq(parameterSets.id, id)));
}

export async function deleteParameterSetRow(db: Executor, id: string) {
  await db.delete(parameterSets).where(eq(parameterSets.id, id));
}

/** The id of the team's set of that name; undefined when there is none. */
export async function findParameterSetIdByName(db: Executor, teamId: string, name: string) {
  const [existing] = await db
    .select({ id: parameterSets.id })
    .from(parameterSets)
    .where(and(eq(parameterSets.teamId, teamId), eq(parameterSets.name, name)));
  return existing;
}

/** The stored versions of a team's sets with author ids, for the team export; oldest first. */
export async function listTeamSetVersionRows(db: Executor, teamId: string) {
  return db
    .select({
      setId: parameterSetVersions.setId,
      version: parameterSetVersions.version,
      values: parameterSetVersions.values,
      provenance: parameterSetVersions.provenance,
      createdBy: parameterSetVersions.createdBy,
      createdAt: parameterSetVersions.createdAt,
    })
    .from(parameterSetVersions)
    .innerJoin(parameterSets, eq(parameterSets.id, parameterSetVersions.setId))
    .where(eq(parameterSets.teamId, teamId))
    .orderBy(asc(parameterSetVersions.setId), asc(parameterSetVersions.version));
}

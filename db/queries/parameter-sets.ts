import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";

import type { Executor } from "@/db/client";
import { parameterSets } from "@/db/schema/parameter-sets";
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

export async function insertParameterSet(db: Executor, values: NewParameterSet) {
  const [row] = await db.insert(parameterSets).values(values).returning({ id: parameterSets.id });
  return row;
}

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

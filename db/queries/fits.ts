import { and, desc, eq } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { fits } from "@/db/schema/fits";
import { parameterSets } from "@/db/schema/parameter-sets";
import { users } from "@/db/schema/users";

import { personRef } from "./users-view";

type NewFit = typeof fits.$inferInsert;

export async function insertFit(db: Executor, values: NewFit): Promise<string> {
  const [row] = await db.insert(fits).values(values).returning({ id: fits.id });
  return row.id;
}

function fitQuery(db: Executor) {
  return db
    .select({
      id: fits.id,
      recordIds: fits.recordIds,
      method: fits.method,
      options: fits.options,
      params: fits.params,
      reports: fits.reports,
      residuals: fits.residuals,
      warnings: fits.warnings,
      uncertainty: fits.uncertainty,
      parameterSetId: fits.parameterSetId,
      parameterSetName: parameterSets.name,
      createdBy: personRef(users.id, users.name),
      createdAt: fits.createdAt,
    })
    .from(fits)
    .leftJoin(users, eq(users.id, fits.createdBy))
    .leftJoin(parameterSets, eq(parameterSets.id, fits.parameterSetId));
}

type FitViewRow = Awaited<ReturnType<ReturnType<typeof fitQuery>["execute"]>>[number];

function toView(row: FitViewRow) {
  return { ...row, createdAt: row.createdAt.toISOString() };
}
export type FitView = ReturnType<typeof toView>;

export async function listFitsForTeam(db: Executor, teamId: string) {
  const rows = await fitQuery(db).where(eq(fits.teamId, teamId)).orderBy(desc(fits.createdAt));
  return rows.map(toView);
}

export async function findFitView(db: Executor, teamId: string, id: string) {
  const [row] = await fitQuery(db).where(and(eq(fits.teamId, teamId), eq(fits.id, id)));
  return row ? toView(row) : null;
}

import { and, asc, desc, eq, sql } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { parameterStudies, studyItems, type StudyItemRow } from "@/db/schema/parameter-studies";

export async function insertStudy(
  db: Executor,
  study: typeof parameterStudies.$inferInsert,
  items: Omit<typeof studyItems.$inferInsert, "studyId">[],
) {
  const [row] = await db.insert(parameterStudies).values(study).returning();
  const ids = await db
    .insert(studyItems)
    .values(items.map((item) => ({ ...item, studyId: row.id })))
    .returning({ id: studyItems.id });
  return { study: row, itemIds: ids.map((i) => i.id) };
}

export async function findStudyInTeam(db: Executor, teamId: string, studyId: string) {
  const [row] = await db
    .select()
    .from(parameterStudies)
    .where(and(eq(parameterStudies.id, studyId), eq(parameterStudies.teamId, teamId)));
  return row ?? null;
}

/** Per item, without its CSV. */
export async function listStudyItems(db: Executor, studyId: string) {
  return db
    .select({
      position: studyItems.position,
      setId: sql<string>`${studyItems.set}->>'id'`,
      label: sql<string>`${studyItems.set}->>'label'`,
      state: studyItems.state,
      status: studyItems.status,
      error: studyItems.error,
      attempts: studyItems.attempts,
    })
    .from(studyItems)
    .where(eq(studyItems.studyId, studyId))
    .orderBy(asc(studyItems.position));
}

export async function listStudyResults(db: Executor, studyId: string): Promise<StudyItemRow[]> {
  return db
    .select()
    .from(studyItems)
    .where(eq(studyItems.studyId, studyId))
    .orderBy(asc(studyItems.position));
}

/** The item with its study's path, for a worker; counts the attempt. */
export async function claimStudyItem(db: Executor, itemId: string) {
  const [item] = await db
    .update(studyItems)
    .set({ attempts: sql`${studyItems.attempts} + 1` })
    .where(eq(studyItems.id, itemId))
    .returning();
  if (!item) return null;
  const [study] = await db
    .select({ legs: parameterStudies.legs })
    .from(parameterStudies)
    .where(eq(parameterStudies.id, item.studyId));
  return study ? { item, legs: study.legs } : null;
}

export async function finishStudyItem(
  db: Executor,
  itemId: string,
  values: Pick<StudyItemRow, "state" | "csv" | "status" | "error">,
) {
  await db
    .update(studyItems)
    .set({ ...values, finishedAt: new Date() })
    .where(eq(studyItems.id, itemId));
}

export async function listStudiesForTeam(db: Executor, teamId: string, limit = 20) {
  return db
    .select({
      id: parameterStudies.id,
      name: parameterStudies.name,
      total: parameterStudies.total,
      createdAt: parameterStudies.createdAt,
      done: sql<number>`(select count(*)::int from study_items i where i.study_id = parameter_studies.id and i.state = 'done')`,
      failed: sql<number>`(select count(*)::int from study_items i where i.study_id = parameter_studies.id and i.state = 'failed')`,
    })
    .from(parameterStudies)
    .where(eq(parameterStudies.teamId, teamId))
    .orderBy(desc(parameterStudies.createdAt))
    .limit(limit);
}

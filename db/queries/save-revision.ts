import { sql } from "drizzle-orm";

import type { Executor } from "@/db/client";

export interface SaveOnTop {
  scenarioId: string;
  teamId: string;
  /** The revision the author started from; the save lands only while it is still the newest. */
  base: number;
  authorId: string;
  message: string;
  file: Record<string, unknown>;
  at: Date;
}

/**
 * A save in one statement: moves the scenario's newest revision from `base` to `base + 1`,
 * inserts that revision and its audit event. One statement is one atomic unit, so the save
 * needs no BEGIN/COMMIT round trips. The UPDATE takes the scenario's row lock; a second save
 * from the same base waits for it, then finds `latest_revision` moved on (READ COMMITTED
 * re-reads the row) and writes nothing. The unique (scenario, number) pair stays the second
 * line. Null when nothing was written: no such scenario in the team, or `base` is not the newest.
 */
export async function insertRevisionOnTop(
  db: Executor,
  save: SaveOnTop,
): Promise<{ id: string; number: number } | null> {
  // Drizzle hands raw parameters to the driver as they are: dates go as ISO text, cast below.
  const at = save.at.toISOString();
  const rows = await db.execute<{ id: string; number: number }>(sql`
    with bumped as (
      update scenarios
      set latest_revision = latest_revision + 1, latest_review_state = 'draft', updated_at = ${at}::timestamptz
      where id = ${save.scenarioId}::uuid and team_id = ${save.teamId}::uuid
        and latest_revision = ${save.base}::int
      returning id, latest_revision
    ), saved as (
      insert into scenario_revisions (scenario_id, number, author_id, message, file, created_at)
      select id, latest_revision, ${save.authorId}::uuid, ${save.message}::text,
             ${JSON.stringify(save.file)}::jsonb, ${at}::timestamptz
      from bumped
      returning id, number
    ), audited as (
      insert into audit_events (actor_id, team_id, action, target, detail)
      select ${save.authorId}::uuid, ${save.teamId}::uuid, 'revision.save', id::text,
             jsonb_build_object('number', latest_revision, 'base', ${save.base}::int)
      from bumped
    )
    select id, number from saved`);
  return rows[0] ?? null;
}

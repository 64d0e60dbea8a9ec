import { sql } from "drizzle-orm";

import type { Db } from "@/db/client";

import type { Acked } from "./mixed-load";

/** How many acknowledged saves and comments the database does not hold (must be 0). */
export async function countLost(
  db: Db,
  acked: Acked,
): Promise<{ saves: number; comments: number }> {
  let saves = 0;
  // In slices: a long run acknowledges tens of thousands of saves.
  for (let i = 0; i < acked.saves.length; i += 2000) {
    const slice = acked.saves.slice(i, i + 2000);
    const pairs = JSON.stringify(slice.map((s) => [s.scenarioId, s.number]));
    const [row] = await db.execute<{ missing: number }>(sql`
      select count(*)::int as missing
      from jsonb_array_elements(${pairs}::jsonb) as a
      where not exists (
        select 1 from scenario_revisions r
        where r.scenario_id = (a->>0)::uuid and r.number = (a->>1)::int)`);
    saves += row.missing;
  }
  let comments = 0;
  for (let i = 0; i < acked.comments.length; i += 2000) {
    const ids = JSON.stringify(acked.comments.slice(i, i + 2000));
    const [row] = await db.execute<{ missing: number }>(sql`
      select count(*)::int as missing from jsonb_array_elements_text(${ids}::jsonb) as c(id)
      where not exists (select 1 from revision_comments rc where rc.id = c.id::uuid)`);
    comments += row.missing;
  }
  return { saves, comments };
}

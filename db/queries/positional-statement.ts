import { sql } from "drizzle-orm";

import type { Executor } from "@/db/client";

/**
 * Runs a statement written with `$1`, `$2` … placeholders (as pg-boss writes its own) on one of
 * our handles, a transaction among them, so it commits or rolls back with the caller's rows.
 * The values become bound parameters of a drizzle query; the text is taken as written.
 */
export async function executePositionalStatement(
  db: Executor,
  text: string,
  values: unknown[],
): Promise<unknown[]> {
  const pieces = text.split(/\$(\d+)/);
  const query = sql.join(
    // An undefined value would vanish from drizzle's SQL (pg-boss passes unset defaults so):
    // it is bound as NULL, as pg does.
    pieces.map((piece, i) => (i % 2 ? sql`${values[Number(piece) - 1] ?? null}` : sql.raw(piece))),
    sql.raw(""),
  );
  return [...(await db.execute(query))];
}

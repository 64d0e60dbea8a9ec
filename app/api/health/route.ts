import { sql } from "drizzle-orm";

import { getDb } from "@/db/index";
import {
  classifyDbError,
  DB_RETRY_AFTER_SECONDS,
  DB_UNAVAILABLE_MESSAGE,
} from "@/lib/server/http/db-errors";

/**
 * Public and cheap: 200 when the database answers, 503 with Retry-After when it does not.
 * Error pages ask it whether to say "the database is not reachable" (production hides the
 * cause of a render error from the browser), and monitors can poll it.
 */
export async function GET(): Promise<Response> {
  try {
    await getDb().execute(sql`select 1`);
    return Response.json(
      { ok: true, database: "up" },
      { headers: { "cache-control": "no-store" } },
    );
  } catch (error) {
    const outage = classifyDbError(error)?.kind === "unavailable";
    if (!outage) console.error("[health]", error);
    return Response.json(
      { ok: false, database: "unreachable", message: DB_UNAVAILABLE_MESSAGE },
      {
        status: 503,
        headers: { "cache-control": "no-store", "retry-after": String(DB_RETRY_AFTER_SECONDS) },
      },
    );
  }
}

import { drizzle, type PostgresJsDatabase } from "drizzle-orm/postgres-js";
import postgres from "postgres";

// Plain factory (no server-only, no Next) so tests and scripts can open their own handle.
export type Db = PostgresJsDatabase;
/** A handle or an open transaction: service helpers accept either. */
export type Executor = Db | Parameters<Parameters<Db["transaction"]>[0]>[0];

export interface DbHandle {
  db: Db;
  close: () => Promise<void>;
}

export function createDb(url: string, options: { max?: number } = {}): DbHandle {
  const sql = postgres(url, {
    // Small pool: 2 shared cores, one app process; idle connections are closed after a minute.
    max: options.max ?? 10,
    idle_timeout: 60,
    connect_timeout: 10,
    // Wait between reconnect attempts after failures, in seconds. The driver's default grows to
    // 20 s with failures counted across the pool, so after a short database outage requests
    // queued behind a backed-off connection would hang long after the server was back. Capped
    // at 1 s, the app serves again within about a second of the database returning.
    backoff: (retries: number) => Math.min(0.05 * 2 ** retries, 1),
    // Quiet NOTICE lines (e.g. "relation already exists, skipping") from migrations.
    onnotice: () => {},
  });
  return { db: drizzle(sql), close: () => sql.end({ timeout: 5 }) };
}

export function requireDatabaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (postgres://user@host:port/db)");
  return url;
}

import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

import postgres from "postgres";
import { describe, expect, it } from "vitest";

import { createDb, requireDatabaseUrl } from "@/db/client";
import { saveRevision } from "@/lib/server/workspace/revisions";

import { makeWorld, demoFileWith } from "../support/workspace";

// scripts/backup.sh and scripts/restore.sh end to end: a database of its own is migrated and
// filled, dumped, dropped, restored under the same name, and must come back row for row.
const server = requireDatabaseUrl().replace(/\/[^/?]+(\?.*)?$/, "");
const name = `craq_backup_${process.pid}_${Date.now().toString(36)}`;
const url = `${server}/${name}`;

async function withSql<T>(target: string, fn: (sql: postgres.Sql) => Promise<T>): Promise<T> {
  const sql = postgres(target, { max: 1, onnotice: () => {} });
  try {
    return await fn(sql);
  } finally {
    await sql.end();
  }
}

/** Row count of every table outside the system schemas, and one digest over all revisions. */
async function fingerprint(target: string) {
  return withSql(target, async (sql) => {
    const tables = await sql<{ schema: string; table: string }[]>`
      select table_schema as schema, table_name as table from information_schema.tables
      where table_type = 'BASE TABLE' and table_schema not in ('pg_catalog', 'information_schema')
      order by 1, 2`;
    const counts: Record<string, number> = {};
    for (const { schema, table } of tables) {
      const [row] = await sql`select count(*)::int as n from ${sql(schema)}.${sql(table)}`;
      counts[`${schema}.${table}`] = row.n;
    }
    const [digest] = await sql`
      select md5(coalesce(string_agg(md5(r::text), '' order by r.scenario_id, r.number), '')) as sum
      from scenario_revisions r`;
    return { counts, revisions: digest.sum as string };
  });
}

function run(script: string, args: string[], env: Record<string, string> = {}) {
  return spawnSync("bash", [script, ...args], {
    env: { ...process.env, ...env },
    encoding: "utf8",
  });
}

describe("backup and restore", () => {
  it("dumps, drops, restores into a fresh database and gets every row back", async () => {
    await withSql(`${server}/postgres`, (sql) => sql.unsafe(`create database "${name}"`));
    execFileSync("npx", ["tsx", "db/migrate.ts"], { env: { ...process.env, DATABASE_URL: url } });
    const handle = createDb(url, { max: 2 });
    try {
      const w = await makeWorld(handle.db);
      await saveRevision(handle.db, w.members.editor, w.slug, w.scenarioId, {
        baseRevision: 1,
        message: "stiffer",
        file: demoFileWith(13000),
      });
    } finally {
      await handle.close();
    }
    const before = await fingerprint(url);
    expect(before.counts["public.scenario_revisions"]).toBe(2);
    expect(before.counts["public.users"]).toBeGreaterThanOrEqual(5);

    const file = path.join(mkdtempSync(path.join(tmpdir(), "craq-backup-")), "team.dump");
    const dump = run("scripts/backup.sh", [file], { DATABASE_URL: url });
    expect(dump.status, dump.stderr).toBe(0);
    expect(dump.stdout.trim()).toBe(file);

    await withSql(`${server}/postgres`, (sql) =>
      sql.unsafe(`drop database "${name}" with (force)`),
    );
    const restore = run("scripts/restore.sh", [file, url]);
    expect(restore.status, restore.stderr).toBe(0);
    expect(await fingerprint(url)).toEqual(before);

    // The database now exists: a second restore under its name is refused and changes nothing.
    const again = run("scripts/restore.sh", [file, url]);
    expect(again.status).not.toBe(0);
    expect(again.stderr).toContain("already exists");
    expect(await fingerprint(url)).toEqual(before);
    await withSql(`${server}/postgres`, (sql) =>
      sql.unsafe(`drop database "${name}" with (force)`),
    );
  });
});

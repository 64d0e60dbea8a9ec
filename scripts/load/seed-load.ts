import { readFileSync } from "node:fs";
import path from "node:path";

import { sql } from "drizzle-orm";

import type { Db } from "@/db/client";
import { createLucia, SESSION_COOKIE } from "@/lib/server/accounts/auth/lucia";
import { createSessionToken } from "@/lib/server/accounts/auth/session-token";
import { hashPassword } from "@/lib/server/accounts/auth/password";

export interface LoadSeed {
  teamSlug: string;
  /** One signed-in editor per client: the API counts requests per person. */
  cookies: string[];
  /** One scenario per client, so concurrent saves race nobody but the fault being injected. */
  scenarioIds: string[];
  /** The team's one reviewer, whom review requests are asked of. */
  reviewerId: string;
}

/**
 * A team of `clients` editors plus a reviewer, each editor with a scenario at revision 1 and a
 * session cookie, written in a few set-based statements. The slug is unique per call.
 */
export async function seedLoad(db: Db, clients: number): Promise<LoadSeed> {
  const file = readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8");
  const { hash, salt } = await hashPassword("load password 1");
  const slug = `load-${Date.now().toString(36)}`;
  const [team] = await db.execute<{ id: string }>(
    sql`insert into teams (slug, name) values (${slug}, 'Load team') returning id`,
  );
  const people = await db.execute<{ id: string; i: number }>(sql`
    insert into users (email, name, password_hash, password_salt, verified_at)
    select ${slug} || '-' || i || '@load.craquelure.local', 'Load editor ' || i, ${hash}, ${salt}, now()
    from generate_series(0, ${clients}) as i
    returning id, (regexp_match(email, '-(\\d+)@'))[1]::int as i`);
  const ordered = [...people].sort((a, b) => a.i - b.i).map((p) => p.id);
  const [reviewer, ...editors] = ordered;
  await db.execute(sql`
    insert into memberships (team_id, user_id, role)
    select ${team.id}::uuid, u, case when u = ${reviewer}::uuid then 'reviewer' else 'editor' end::team_role
    from unnest(${sql.raw(`array[${ordered.map((id) => `'${id}'`).join(",")}]`)}::uuid[]) as u`);
  const scenarios = await db.execute<{ id: string; author: string }>(sql`
    insert into scenarios (team_id, name, material_label, tags, created_by, latest_revision)
    select ${team.id}::uuid, 'Load scenario ' || lpad(ord::text, 4, '0'), 'SMC', array['load'], u, 1
    from unnest(${sql.raw(`array[${editors.map((id) => `'${id}'`).join(",")}]`)}::uuid[]) with ordinality as t(u, ord)
    returning id, created_by as author`);
  await db.execute(sql`
    insert into scenario_revisions (scenario_id, number, author_id, message, file)
    select s.id, 1, s.created_by, 'start', ${file}::jsonb from scenarios s where s.team_id = ${team.id}::uuid`);
  const byAuthor = new Map(scenarios.map((s) => [s.author, s.id]));
  const lucia = createLucia(db, { secureCookies: false });
  const cookies: string[] = [];
  for (const id of editors)
    cookies.push(`${SESSION_COOKIE}=${(await createSessionToken(lucia, id)).token}`);
  return {
    teamSlug: slug,
    cookies,
    scenarioIds: editors.map((id) => byAuthor.get(id)!),
    reviewerId: reviewer,
  };
}

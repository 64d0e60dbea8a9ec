import { readFileSync } from "node:fs";
import path from "node:path";

import { sql } from "drizzle-orm";

import type { Db } from "@/db/client";
import { memberships, teams } from "@/db/schema/teams";
import { users } from "@/db/schema/users";
import { hashPassword } from "@/lib/server/accounts/auth/password";

export const BENCH_SCENARIOS = 10_000;
export const REVISIONS_PER_SCENARIO = 10;

/**
 * Requests are spread over this many signed-in editors: the API counts requests per person
 * (lib/server/http/token-route.ts), and one shared session would measure that limiter instead.
 */
export const BENCH_USERS = 200;

export interface BenchSeed {
  teamSlug: string;
  userIds: string[];
}

/**
 * One team with 10,000 scenarios of 10 revisions each (100,000 revisions), written by
 * generate_series in a few statements rather than row by row.
 */
export async function seedBench(db: Db): Promise<BenchSeed> {
  const file = readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8");
  const { hash, salt } = await hashPassword("bench password 1");
  const [user] = await db
    .insert(users)
    .values({
      email: "bench@bench.craquelure.local",
      name: "Bench editor",
      passwordHash: hash,
      passwordSalt: salt,
      verifiedAt: new Date(),
    })
    .returning({ id: users.id });
  const [team] = await db
    .insert(teams)
    .values({ slug: "bench", name: "Bench team" })
    .returning({ id: teams.id, slug: teams.slug });
  const others = await db.execute<{ id: string }>(sql`
    insert into users (email, name, password_hash, password_salt, verified_at)
    select 'bench-' || i || '@bench.craquelure.local', 'Bench editor ' || i, ${hash}, ${salt}, now()
    from generate_series(2, ${BENCH_USERS}) as i
    returning id`);
  const userIds = [user.id, ...others.map((r) => r.id)];
  await db
    .insert(memberships)
    .values(userIds.map((userId) => ({ teamId: team.id, userId, role: "editor" as const })));

  await db.execute(sql`
    insert into scenarios (team_id, name, material_label, tags, created_by, latest_revision, created_at, updated_at)
    select ${team.id}::uuid, 'Bench scenario ' || lpad(i::text, 5, '0'),
           (array['SMC', 'PA6-GF30', 'PP-GF20'])[1 + i % 3],
           array['bench', 'group-' || (i % 20)], ${user.id}::uuid, ${REVISIONS_PER_SCENARIO},
           now() - make_interval(mins => i), now() - make_interval(mins => i)
    from generate_series(1, ${BENCH_SCENARIOS}) as i`);
  await db.execute(sql`
    insert into scenario_revisions (scenario_id, number, author_id, message, file, created_at, review_state)
    select s.id, n, ${user.id}::uuid, 'revision ' || n, ${file}::jsonb,
           s.created_at - make_interval(secs => ${REVISIONS_PER_SCENARIO} - n),
           (case when n = ${REVISIONS_PER_SCENARIO} and random() < 0.3 then 'in_review' else 'draft' end)::review_state
    from scenarios s cross join generate_series(1, ${REVISIONS_PER_SCENARIO}) as n
    where s.team_id = ${team.id}::uuid`);
  await db.execute(sql`
    update scenarios s set latest_review_state = r.review_state
    from scenario_revisions r
    where r.scenario_id = s.id and r.number = s.latest_revision and r.review_state <> 'draft'`);
  await db.execute(sql`analyze`);
  return { teamSlug: team.slug, userIds };
}

/** Scenario ids in a fixed order, for the save phase to spread its writes over. */
export async function benchScenarioIds(db: Db, teamSlug: string): Promise<string[]> {
  const rows = await db.execute<{ id: string }>(sql`
    select s.id from scenarios s join teams t on t.id = s.team_id
    where t.slug = ${teamSlug} order by s.name`);
  return rows.map((r) => r.id);
}

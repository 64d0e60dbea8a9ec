/**
 * Isolation of the request thread (run through scripts/bench-isolation.sh, which provides the
 * database and the build): while 4 clients each run the largest path the API takes, and a
 * calibration report (6 sets on that path) and a conformance check (100,000 history rows) are
 * computed, 20 clients poll `GET /api/health`. The heavy work runs in the compute pool, so
 * health should answer as on a quiet server. Every client signs in as a person of its own: the
 * pool caps tasks per person.
 *
 * The heavy clients stand for remote users: they run in a child process at nice 10
 * (load/isolation-load-child.ts), because on this one machine their own CPU — reading 4 × ~100 MB
 * of run output — would otherwise take the cores from the server under test, which on a real
 * deployment it would not. Same run size, same number of clients; the health pollers stay here
 * at normal priority and time each answer.
 */
import { fork, type ChildProcess } from "node:child_process";
import os from "node:os";
import path from "node:path";

import { createDb, requireDatabaseUrl, type Db } from "@/db/client";
import { memberships, teams } from "@/db/schema/teams";
import { users } from "@/db/schema/users";
import { createLucia, SESSION_COOKIE } from "@/lib/server/accounts/auth/lucia";
import { hashPassword } from "@/lib/server/accounts/auth/password";
import { createSessionToken } from "@/lib/server/accounts/auth/session-token";
import { createScenario } from "@/lib/server/workspace/scenarios";

import { sleep, startApp, stopApp, waitFor200 } from "./load/app-process";
import { largestFile, RUN_CLIENTS, type HeavyLoad, type HeavyResult } from "./load/isolation-load";
import { busiestThreads, threadTimes } from "./load/thread-cpu";

const PORT = Number(process.env.BENCH_APP_PORT ?? 31000);
const BASE = `http://127.0.0.1:${PORT}`;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 30);
const HEALTH_CLIENTS = 20;

async function seed(db: Db, people: number) {
  const { hash, salt } = await hashPassword("bench password 1");
  const [team] = await db
    .insert(teams)
    .values({ slug: "isolation", name: "Isolation bench team" })
    .returning({ id: teams.id, slug: teams.slug });
  const created = await db
    .insert(users)
    .values(
      Array.from({ length: people }, (_, i) => ({
        email: `isolation-${i}@bench.craquelure.local`,
        name: `Bench person ${i}`,
        passwordHash: hash,
        passwordSalt: salt,
        verifiedAt: new Date(),
      })),
    )
    .returning({ id: users.id, email: users.email, name: users.name });
  await db
    .insert(memberships)
    .values(created.map((u) => ({ teamId: team.id, userId: u.id, role: "editor" as const })));
  const editor = { ...created[0], verified: true };
  const scenario = await createScenario(db, editor, team.slug, {
    name: "Isolation bench: largest path",
    materialLabel: "invented demo material",
    tags: ["bench"],
    file: largestFile(),
  });
  const lucia = createLucia(db, { secureCookies: false });
  const cookies: string[] = [];
  for (const u of created) {
    cookies.push(`${SESSION_COOKIE}=${(await createSessionToken(lucia, u.id)).token}`);
  }
  return { teamSlug: team.slug, scenarioId: scenario.scenario.id, cookies };
}

const p95 = (xs: number[]) => {
  const sorted = [...xs].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * 0.95))] ?? NaN;
};
const ms1 = (x: number) => Math.round(x * 10) / 10;

/**
 * Starts the heavy clients' child process (nice 10) and waits until it is ready, so its start-up
 * is not counted in the load window; `run` hands it the load and resolves with what it counted.
 */
async function forkHeavyClients() {
  const child = fork(path.join(process.cwd(), "scripts/load/isolation-load-child.ts"), [], {
    execArgv: ["--import", "tsx"],
  });
  const ended = new Promise<never>((_, reject) =>
    child.once("exit", (code) => reject(new Error(`heavy clients ended (${code}) early`))),
  );
  const next = () => new Promise<unknown>((resolve) => child.once("message", resolve));
  await Promise.race([next(), ended]);
  return {
    child,
    run(load: HeavyLoad): Promise<HeavyResult> {
      child.send(load);
      return Promise.race([next() as Promise<HeavyResult>, ended]);
    },
  };
}

async function main() {
  const { db, close } = createDb(requireDatabaseUrl(), { max: 2 });
  let app: ChildProcess | undefined;
  let clients: ChildProcess | undefined;
  process.on("exit", () => {
    stopApp(app);
    clients?.kill();
  });
  try {
    const s = await seed(db, RUN_CLIENTS + 2);
    app = startApp(PORT, process.env.BENCH_APP_LOG ?? "/dev/null");
    const ready = await waitFor200(`${BASE}/api/health`, {}, 120_000);
    console.log(`server ready in ${(ready / 1000).toFixed(1)} s on ${BASE}`);

    const heavyClients = await forkHeavyClients();
    clients = heavyClients.child;
    const appThreadsBefore = threadTimes(app.pid!);
    const benchCpuBefore = process.cpuUsage();
    const until = Date.now() + SECONDS * 1000;
    const heavy = heavyClients.run({
      base: BASE,
      until,
      teamSlug: s.teamSlug,
      scenarioId: s.scenarioId,
      cookies: s.cookies,
    });
    const health: number[] = [];
    let healthErrors = 0;
    const healthClient = async () => {
      await sleep(1000); // let the heavy work start first
      while (Date.now() < until) {
        const t = performance.now();
        try {
          const res = await fetch(`${BASE}/api/health`);
          await res.arrayBuffer();
          if (res.status === 200) health.push(performance.now() - t);
          else healthErrors++;
        } catch {
          healthErrors++;
        }
        await sleep(50);
      }
    };
    const [{ statuses, runsOk, cpuSeconds }] = await Promise.all([
      heavy,
      ...Array.from({ length: HEALTH_CLIENTS }, healthClient),
    ]);
    const benchCpu = process.cpuUsage(benchCpuBefore);
    const busiest = busiestThreads(appThreadsBefore, threadTimes(app.pid!));
    if (busiest.length > 0)
      console.log(`CPU of the server's busiest threads:\n${busiest.join("\n")}`);
    console.log(`CPU of the heavy clients' process (nice 10): ${cpuSeconds.toFixed(1)} s`);
    console.log(
      `CPU of the health pollers' process: ${((benchCpu.user + benchCpu.system) / 1e6).toFixed(1)} s in ${SECONDS} s`,
    );
    const load = os
      .loadavg()
      .map((x) => x.toFixed(1))
      .join(" ");
    console.log(
      `answers: ${JSON.stringify(statuses)}; health polls ${health.length}, failed ${healthErrors}`,
    );
    console.log(
      `machine: ${os.cpus().length} cores, load average ${load} (shared with other work)`,
    );
    console.log(
      `goal: health_p95 < 50 ms (${RUN_CLIENTS} run clients, a report and a conformance client, ${HEALTH_CLIENTS} health clients, ${SECONDS} s, loopback)`,
    );
    console.log(
      `bench:isolation: health_p95=${ms1(p95(health))} health_max=${ms1(Math.max(...health))} runs_ok=${runsOk}`,
    );
  } finally {
    clients?.kill();
    stopApp(app);
    await close();
  }
}

main().catch((error: unknown) => {
  console.error("bench:isolation failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});

/**
 * Isolation of the request thread (run through scripts/bench-isolation.sh, which provides the
 * database and the build): while 4 clients each run the largest path the API takes, and a
 * calibration report (6 sets on that path) and a conformance check (100,000 history rows) are
 * computed, 20 clients poll `GET /api/health`. The heavy work runs in the compute pool, so
 * health should answer as on a quiet server. Every client signs in as a person of its own: the
 * pool caps tasks per person.
 */
import type { ChildProcess } from "node:child_process";
import { readFileSync } from "node:fs";
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
import { busiestThreads, threadTimes } from "./load/thread-cpu";

const PORT = Number(process.env.BENCH_APP_PORT ?? 31000);
const BASE = `http://127.0.0.1:${PORT}`;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 30);
const RUN_CLIENTS = 4;
const HEALTH_CLIENTS = 20;
const HISTORY_ROWS = 100_000;

/** 1,000,000 increments (the API's limit) of tension cycles below failure. */
function largestFile() {
  const file = JSON.parse(
    readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
  );
  const leg = (target: number) => ({
    control: ["strain", "stress", "stress"],
    target: [target, 0, 0],
    increments: 250_000,
  });
  file.path.legs = [leg(0.006), leg(0), leg(0.006), leg(0)];
  // Six sets, the loading desk's most: the report runs the path once per set.
  file.parameterSets = [1, 2, 3, 4, 5, 6].map((i) => ({
    ...file.parameterSets[0],
    id: `S${i}`,
    E1: 10_000 + 200 * i,
  }));
  return file;
}

/** A uniaxial strain ramp in the contract's columns; its stresses are invented (the check fails). */
function historyCsv(): string {
  const lines = ["increment,eps11,eps22,gam12,sig11,sig22,sig12"];
  for (let i = 0; i < HISTORY_ROWS; i++) {
    const e = (0.006 * i) / HISTORY_ROWS;
    lines.push(`${i},${e},${-0.3 * e},0,${11_000 * e},0,0`);
  }
  return lines.join("\n") + "\n";
}

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

async function main() {
  const { db, close } = createDb(requireDatabaseUrl(), { max: 2 });
  let app: ChildProcess | undefined;
  process.on("exit", () => stopApp(app));
  try {
    const s = await seed(db, RUN_CLIENTS + 2);
    const file = largestFile();
    const history = historyCsv();
    app = startApp(PORT, process.env.BENCH_APP_LOG ?? "/dev/null");
    const ready = await waitFor200(`${BASE}/api/health`, {}, 120_000);
    console.log(`server ready in ${(ready / 1000).toFixed(1)} s on ${BASE}`);

    const appThreadsBefore = threadTimes(app.pid!);
    const benchCpuBefore = process.cpuUsage();
    const until = Date.now() + SECONDS * 1000;
    const statuses: Record<string, number> = {};
    const count = (what: string, status: number | "cut") => {
      const key = `${what} ${status}`;
      statuses[key] = (statuses[key] ?? 0) + 1;
    };
    /** One request, read to its end; a stream cut by the server (a run over budget) counts as "cut". */
    const send = async (what: string, url: string, init: RequestInit): Promise<number> => {
      try {
        const res = await fetch(url, init);
        const bytes = (await res.arrayBuffer()).byteLength;
        count(what, res.status);
        return res.status === 200 && bytes > 0 ? 200 : res.status;
      } catch {
        count(what, "cut");
        return 0;
      }
    };
    let runsOk = 0;
    const runClient = async (cookie: string) => {
      while (Date.now() < until) {
        // The whole body is read: a run is only done once its output has arrived.
        const status = await send("run", `${BASE}/api/v1/runs`, {
          method: "POST",
          headers: { cookie, "content-type": "application/json", origin: BASE },
          body: JSON.stringify({ scenario: file, format: "csv" }),
        });
        if (status === 200) runsOk++;
        if (status === 429 || status === 503) await sleep(1000);
      }
    };
    const reportClient = async (cookie: string) => {
      while (Date.now() < until) {
        await send("report", `${BASE}/reports/${s.teamSlug}/${s.scenarioId}/1`, {
          headers: { cookie },
        });
      }
    };
    const conformanceClient = async (cookie: string) => {
      const url = `${BASE}/api/v1/teams/${s.teamSlug}/scenarios/${s.scenarioId}/revisions/1/conformance`;
      while (Date.now() < until) {
        await send("conformance", url, {
          method: "POST",
          headers: { cookie, "content-type": "application/json", origin: BASE },
          body: JSON.stringify({ fileName: "bench-history.csv", text: history, set: "S1" }),
        });
      }
    };
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
    await Promise.all([
      ...s.cookies.slice(0, RUN_CLIENTS).map(runClient),
      reportClient(s.cookies[RUN_CLIENTS]),
      conformanceClient(s.cookies[RUN_CLIENTS + 1]),
      ...Array.from({ length: HEALTH_CLIENTS }, healthClient),
    ]);
    const benchCpu = process.cpuUsage(benchCpuBefore);
    const busiest = busiestThreads(appThreadsBefore, threadTimes(app.pid!));
    if (busiest.length > 0)
      console.log(`CPU of the server's busiest threads:\n${busiest.join("\n")}`);
    console.log(
      `CPU of this bench process (all clients): ${((benchCpu.user + benchCpu.system) / 1e6).toFixed(1)} s in ${SECONDS} s`,
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
    stopApp(app);
    await close();
  }
}

main().catch((error: unknown) => {
  console.error("bench:isolation failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});

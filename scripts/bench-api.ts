/**
 * Load test of the workspace API (run through scripts/bench-api.sh, which provides the
 * database and the build). Seeds 10,000 scenarios / 100,000 revisions, starts the production
 * server (scripts/serve.ts), then measures with autocannon at 50 connections: a floor
 * (`GET /api/health`, one trivial query through the same stack), the scenarios list route and
 * saving a revision. The ratios compare each route's p95 with the floor's of the same run.
 */
import type { ChildProcess } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";

import { createDb, requireDatabaseUrl } from "@/db/client";
import { createLucia, SESSION_COOKIE } from "@/lib/server/accounts/auth/lucia";
import { createSessionToken } from "@/lib/server/accounts/auth/session-token";

import { measure } from "./bench-api-measure";
import { startApp, stopApp } from "./load/app-process";
import { benchScenarioIds, REVISIONS_PER_SCENARIO, seedBench } from "./bench-api-seed";

const PORT = Number(process.env.BENCH_APP_PORT ?? 30000);
const BASE = `http://127.0.0.1:${PORT}`;
const CONNECTIONS = 50;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 15);

async function waitForApp(url: string, cookie: string) {
  for (let i = 0; i < 300; i++) {
    try {
      if ((await fetch(url, { headers: { cookie } })).ok) return;
    } catch {}
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error("the app did not answer within 60 s");
}

async function main() {
  const { db, close } = createDb(requireDatabaseUrl(), { max: 2 });
  let app: ChildProcess | undefined;
  process.on("exit", () => stopApp(app));
  try {
    let t = Date.now();
    const seed = await seedBench(db);
    const ids = await benchScenarioIds(db, seed.teamSlug);
    console.log(
      `seeded ${ids.length} scenarios × ${REVISIONS_PER_SCENARIO} revisions in ${((Date.now() - t) / 1000).toFixed(1)} s`,
    );
    // The cookies a sign-in would set: one lucia session per bench editor; request i goes out
    // with editor i's session (round robin).
    const lucia = createLucia(db, { secureCookies: false });
    const cookies: string[] = [];
    for (const userId of seed.userIds) {
      cookies.push(`${SESSION_COOKIE}=${(await createSessionToken(lucia, userId)).token}`);
    }
    const cookie = cookies[0];
    let sent = 0;
    const nextCookie = () => cookies[sent++ % cookies.length];
    const listUrl = `${BASE}/api/v1/teams/${seed.teamSlug}/scenarios`;

    t = Date.now();
    app = startApp(PORT, process.env.BENCH_APP_LOG ?? "/dev/null");
    await waitForApp(listUrl, cookie);
    console.log(`server ready in ${((Date.now() - t) / 1000).toFixed(1)} s on ${BASE}`);
    await measure(
      "warm-up",
      {
        url: listUrl,
        connections: 10,
        duration: 3,
        requests: [{ setupRequest: (req) => ({ ...req, headers: { cookie: nextCookie() } }) }],
      },
      app.pid,
    );

    const floor = await measure(
      "floor",
      {
        url: `${BASE}/api/health`,
        connections: CONNECTIONS,
        duration: SECONDS,
        requests: [{ setupRequest: (req) => ({ ...req, headers: { cookie: nextCookie() } }) }],
      },
      app.pid,
    );

    let listIndex = 0;
    const sorts = ["updated", "updated", "name", "review"];
    const list = await measure(
      "list",
      {
        url: listUrl,
        connections: CONNECTIONS,
        duration: SECONDS,
        requests: [
          {
            setupRequest: (req) => {
              const i = listIndex++;
              return {
                ...req,
                headers: { cookie: nextCookie() },
                path: `${new URL(listUrl).pathname}?page=${1 + (i % 40)}&pageSize=25&sort=${sorts[i % sorts.length]}`,
              };
            },
          },
        ],
      },
      app.pid,
    );

    // Each save names the revision it started from; requests walk the 10,000 scenarios so no
    // two in flight share one, and the expected base grows by one per full round.
    const file = JSON.parse(
      readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
    );
    let saveIndex = 0;
    const save = await measure(
      "save",
      {
        url: BASE,
        connections: CONNECTIONS,
        duration: SECONDS,
        method: "POST",
        requests: [
          {
            setupRequest: (req) => {
              const i = saveIndex++;
              const scenario = ids[i % ids.length];
              const base = REVISIONS_PER_SCENARIO + Math.floor(i / ids.length);
              return {
                ...req,
                method: "POST",
                headers: { cookie: nextCookie(), "content-type": "application/json" },
                path: `/api/v1/teams/${seed.teamSlug}/scenarios/${scenario}/revisions`,
                body: JSON.stringify({ baseRevision: base, message: `bench save ${i}`, file }),
              };
            },
          },
        ],
      },
      app.pid,
    );

    for (const p of [floor, list, save]) {
      console.log(
        `${p.name.padEnd(5)} requests=${p.requests} rps=${p.rps} p50=${p.p50}ms p95=${p.p95}ms p99=${p.p99}ms errors=${p.errors} statuses=${JSON.stringify(p.statuses)} app_cpu_per_request=${p.serverCpuMs}ms`,
      );
    }
    const profileDir = process.env.BENCH_CPU_PROF_DIR;
    if (profileDir) {
      // Phase windows for scripts/cpu-profile-top.ts, which keeps only one phase's samples.
      const windows = [floor, list, save].map(({ name, requests, startedUs, endedUs }) => ({
        name,
        requests,
        startedUs,
        endedUs,
      }));
      writeFileSync(path.join(profileDir, "phases.json"), JSON.stringify(windows, null, 2));
    }
    const load = os
      .loadavg()
      .map((x) => x.toFixed(1))
      .join(" ");
    console.log(
      `machine: ${os.cpus().length} cores, load average ${load} (shared with other work)`,
    );
    console.log(
      `goals: list_ratio <= 1.5, save_ratio <= 2.5, list_cpu <= 2 ms, save_cpu <= 3 ms, errors 0 (${CONNECTIONS} connections, ${SECONDS} s each, loopback)`,
    );
    const ratio = (p: { p95: number }) => (p.p95 / Math.max(0.1, floor.p95)).toFixed(2);
    console.log(
      `bench:api: list_p95=${list.p95} save_p95=${save.p95} floor_p95=${floor.p95} list_ratio=${ratio(list)} save_ratio=${ratio(save)} list_cpu=${list.serverCpuMs} save_cpu=${save.serverCpuMs} errors=${floor.errors + list.errors + save.errors}`,
    );
  } finally {
    stopApp(app);
    await close();
  }
}

main().catch((error: unknown) => {
  console.error("bench:api failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});

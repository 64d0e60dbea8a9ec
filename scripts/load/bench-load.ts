/**
 * bench:load (run through scripts/bench-load.sh, which provides the cluster and the build):
 * 100 people at once for 60 s on loopback, each listing, reading, saving a revision and
 * commenting in a loop on a scenario of their own, then a check that every acknowledged save
 * and comment is in the database. Last line:
 * bench:load: rps=<n> p95=<ms> p99=<ms> errors5xx=<n> lost=<n>
 */
import { readFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";

import { createDb, requireDatabaseUrl } from "@/db/client";

import { startApp, stopApp, waitFor200 } from "./app-process";
import { runMixedLoad } from "./mixed-load";
import { seedLoad } from "./seed-load";
import { countLost } from "./verify-acked";

const PORT = Number(process.env.BENCH_APP_PORT);
const BASE = `http://127.0.0.1:${PORT}`;
const CLIENTS = Number(process.env.LOAD_CLIENTS ?? 100);
const SECONDS = Number(process.env.LOAD_SECONDS ?? 60);
const FILE = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
);

async function main() {
  const { db, close } = createDb(requireDatabaseUrl(), { max: 2 });
  const app = startApp(PORT, process.env.BENCH_APP_LOG ?? "/dev/null");
  process.on("exit", () => stopApp(app));
  try {
    const seed = await seedLoad(db, CLIENTS);
    const list = `${BASE}/api/v1/teams/${seed.teamSlug}/scenarios`;
    await waitFor200(list, { headers: { cookie: seed.cookies[0] } }, 90_000);
    // A short warm-up (people of their own, so the measured ones start from revision 1).
    await runMixedLoad(BASE, await seedLoad(db, 10), { connections: 10, seconds: 3, file: FILE });
    console.log(
      `${CLIENTS} clients for ${SECONDS} s on ${BASE} (list, read, save revision, comment)`,
    );
    const r = await runMixedLoad(BASE, seed, {
      connections: CLIENTS,
      seconds: SECONDS,
      file: FILE,
    });
    const lost = await countLost(db, r.acked);
    const load = os
      .loadavg()
      .map((x) => x.toFixed(1))
      .join(" ");
    console.log(`requests=${r.requests} rps=${r.rps} p50=${r.p50}ms p95=${r.p95}ms p99=${r.p99}ms`);
    console.log(`statuses=${JSON.stringify(r.statuses)} socket_errors=${r.socketErrors}`);
    console.log(
      `acknowledged: ${r.acked.saves.length} saves, ${r.acked.comments.length} comments; missing from the database: ${lost.saves} saves, ${lost.comments} comments`,
    );
    console.log(
      `machine: ${os.cpus().length} cores, load average ${load} (shared with other work)`,
    );
    console.log(
      `bench:load: rps=${r.rps} p95=${r.p95} p99=${r.p99} errors5xx=${r.errors5xx} lost=${lost.saves + lost.comments}`,
    );
    if (r.errors5xx > 0 || lost.saves + lost.comments > 0) process.exitCode = 1;
  } finally {
    stopApp(app);
    await close();
  }
}

main().catch((error: unknown) => {
  console.error("bench:load failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});

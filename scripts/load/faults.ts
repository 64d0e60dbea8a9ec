/**
 * test:faults (run through scripts/test-faults.sh, which provides the cluster, the build and
 * the environment): a small mixed load while PostgreSQL is stopped and started, then a review
 * request while the mail server is down. Prints one line per check and, last,
 * `test:faults: passed=<n> failed=<n>`; exits non-zero on any failure.
 */
import { readFileSync } from "node:fs";
import path from "node:path";

import { and, inArray, isNull, sql } from "drizzle-orm";

import { createDb, requireDatabaseUrl } from "@/db/client";
import { mailOutbox } from "@/db/schema/mail-outbox";

import { sleep, startApp, stopApp, waitFor200 } from "./app-process";
import { check, pgControl, startSmtp, stopSmtp, waitForPort, type Check } from "./fault-steps";
import { probeWhileDown } from "./outage-probe";
import { runMixedLoad } from "./mixed-load";
import { seedLoad } from "./seed-load";
import { countLost } from "./verify-acked";

const SHORT = process.env.FAULTS_MODE === "short";
const PLAN = SHORT
  ? { clients: 10, seconds: 16, downAt: 4, downFor: 4 }
  : { clients: 40, seconds: 45, downAt: 10, downFor: 12 };
const PORT = Number(process.env.FAULTS_APP_PORT);
const BASE = `http://127.0.0.1:${PORT}`;
const SMTP_PORT = Number(process.env.SMTP_PORT);
const FILE = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
);

async function main() {
  const checks: Check[] = [];
  const { db, close } = createDb(requireDatabaseUrl(), { max: 2 });
  let smtp = startSmtp();
  const app = startApp(PORT, process.env.FAULTS_APP_LOG ?? "/dev/null");
  process.on("exit", () => stopApp(app));
  try {
    const seed = await seedLoad(db, PLAN.clients);
    const cookie = seed.cookies[0];
    const list = `${BASE}/api/v1/teams/${seed.teamSlug}/scenarios`;
    await waitFor200(list, { headers: { cookie } }, 90_000);
    await waitForPort(SMTP_PORT, 20_000);
    console.log(
      `app up on ${BASE}; ${PLAN.clients} clients for ${PLAN.seconds} s, database down from ${PLAN.downAt} s for ${PLAN.downFor} s`,
    );

    // 1. PostgreSQL stopped and started under load.
    const load = runMixedLoad(BASE, seed, {
      connections: PLAN.clients,
      seconds: PLAN.seconds,
      file: FILE,
    });
    await sleep(PLAN.downAt * 1000);
    pgControl("stop");
    await sleep(500);
    await probeWhileDown(BASE, list, cookie, checks);
    await sleep(PLAN.downFor * 1000 - 500);
    pgControl("start");
    const recovery = await waitFor200(list, { headers: { cookie } }, 15_000).catch(() => Infinity);
    check(
      checks,
      "recovers by itself within 5 s after the database is back",
      recovery <= 5000,
      `${recovery} ms`,
    );
    const result = await load;
    const other5xx = Object.entries(result.statuses).filter(
      ([s]) => Number(s) >= 500 && s !== "503",
    );
    console.log(
      `load: requests=${result.requests} statuses=${JSON.stringify(result.statuses)} socket errors=${result.socketErrors}`,
    );
    console.log(
      `per second: ${result.timeline.map((t, i) => `${i}:${JSON.stringify(t ?? {})}`).join(" ")}`,
    );
    check(
      checks,
      "the outage was seen as 503s, each with Retry-After",
      result.unavailable > 0 && result.unavailableWithRetryAfter === result.unavailable,
      `${result.unavailable} × 503, ${result.unavailableWithRetryAfter} with Retry-After`,
    );
    check(
      checks,
      "no 5xx other than 503",
      other5xx.length === 0,
      JSON.stringify(Object.fromEntries(other5xx)),
    );
    const lost = await countLost(db, result.acked);
    check(
      checks,
      "every acknowledged save and comment is in the database",
      lost.saves === 0 && lost.comments === 0,
      `${result.acked.saves.length} saves, ${result.acked.comments.length} comments acknowledged; lost ${lost.saves} saves, ${lost.comments} comments`,
    );
    const lastSeconds = result.timeline.slice(-3).reduce((n, t) => n + (t?.[201] ?? 0), 0);
    check(
      checks,
      "saves succeed again after the outage",
      lastSeconds > 0,
      `${lastSeconds} × 201 in the last 3 s`,
    );

    // 2. The mail server down: a review request is kept in the outbox and sent when it is back.
    await stopSmtp(smtp);
    const scenario = seed.scenarioIds[0];
    const [row] = await db.execute<{ n: number }>(
      sql`select latest_revision as n from scenarios where id = ${scenario}::uuid`,
    );
    const review = await fetch(`${list}/${scenario}/revisions/${row.n}/review`, {
      method: "POST",
      headers: { cookie, "content-type": "application/json" },
      body: JSON.stringify({
        action: "request",
        note: "while the mail server is down",
        reviewers: [seed.reviewerId],
      }),
    });
    const answer = await review.json();
    check(
      checks,
      "a review request succeeds while the mail server is down",
      review.status === 200,
      `status ${review.status}`,
    );
    check(
      checks,
      "and says its mails were queued",
      answer.mailQueued > 0 && answer.notified === 0,
      `mailQueued ${answer.mailQueued}, notified ${answer.notified}`,
    );
    const queued = await db
      .select({ id: mailOutbox.id })
      .from(mailOutbox)
      .where(isNull(mailOutbox.sentAt));
    check(
      checks,
      "the mails wait in mail_outbox",
      queued.length >= answer.mailQueued,
      `${queued.length} unsent`,
    );
    smtp = startSmtp();
    await waitForPort(SMTP_PORT, 20_000);
    const ids = queued.map((q) => q.id);
    let unsent = ids.length;
    for (let i = 0; i < 120 && unsent > 0; i++) {
      await sleep(500);
      unsent = (
        await db
          .select({ id: mailOutbox.id })
          .from(mailOutbox)
          .where(and(inArray(mailOutbox.id, ids), isNull(mailOutbox.sentAt)))
      ).length;
    }
    check(
      checks,
      "they are sent once the mail server is back",
      unsent === 0,
      `${ids.length - unsent} of ${ids.length} sent`,
    );
  } finally {
    stopApp(app);
    await stopSmtp(smtp);
    await close();
  }
  const failed = checks.filter((c) => !c.ok).length;
  console.log(`test:faults: passed=${checks.length - failed} failed=${failed}`);
  process.exit(failed === 0 ? 0 : 1);
}

main().catch((error: unknown) => {
  console.error("test:faults failed:", error instanceof Error ? error.message : error);
  console.log("test:faults: passed=0 failed=1");
  process.exit(1);
});

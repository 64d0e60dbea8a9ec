/**
 * The compute pool's limits through the real route: a run over its wall-clock budget is stopped
 * with a message that says so and what to change, while /api/health keeps answering; one
 * person's second run while the first is in flight answers 429 with Retry-After.
 * The budget and caps are tiny here (set before the pool starts, on first use in this file).
 */
import { readFileSync } from "node:fs";
import path from "node:path";

import { afterAll, beforeAll, describe, expect, it } from "vitest";

import * as healthRoute from "@/app/api/health/route";
import * as runsRoute from "@/app/api/v1/runs/route";
import { closeComputePool, tasksInFlight } from "@/lib/server/compute/pool";

import { openTestDb } from "../support/db";
import { makeTeamWithAllRoles, type TeamFixture } from "../support/team";
import { closeAppPoolAfterAll } from "../support/workspace";
import { bearer, callText, tokenFor } from "./support";

process.env.COMPUTE_TIME_BUDGET_MS = "400";
process.env.COMPUTE_MAX_TASKS_PER_PERSON = "1";

const db = openTestDb();
closeAppPoolAfterAll();
afterAll(closeComputePool);

const demo = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
);

/** The largest path the API takes: far more than 0.4 s of work on any machine. */
function largestRun() {
  const big = structuredClone(demo);
  big.path.legs = [
    { control: ["strain", "stress", "stress"], target: [0.012, 0, 0], increments: 500_000 },
    { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 500_000 },
  ];
  return big;
}

let t: TeamFixture;
let token: string;
let otherToken: string;

beforeAll(async () => {
  t = await makeTeamWithAllRoles(db);
  token = (await tokenFor(db, t.members.viewer, t.slug, "viewer")).token;
  otherToken = (await tokenFor(db, t.members.editor, t.slug, "viewer")).token;
});

describe("compute pool limits on POST /api/v1/runs", () => {
  it("stops a run over its budget with a clear message while /api/health keeps answering", async () => {
    let settled = false;
    const run = callText(runsRoute.POST, { headers: bearer(token), body: largestRun() }).finally(
      () => void (settled = true),
    );
    const healthWhileRunning: number[] = [];
    while (!settled) {
      const res = await healthRoute.GET();
      if (!settled) healthWhileRunning.push(res.status);
      await new Promise((r) => setTimeout(r, 20));
    }
    const res = await run;
    expect(res.status).toBe(422);
    const error = JSON.parse(res.text).error;
    expect(error.code).toBe("invalid:time-budget");
    expect(error.message).toBe(
      "The run took longer than 0.4 s and was stopped. Try fewer increments (or fewer legs), or run the file on your own machine with the command-line driver (npm run drive).",
    );
    // The request thread was free: health answered (200) while the run was still going.
    expect(healthWhileRunning.length).toBeGreaterThan(0);
    expect(healthWhileRunning.every((s) => s === 200)).toBe(true);
  });

  it("answers a person's second run 429 with Retry-After while the first runs; others still run", async () => {
    const first = callText(runsRoute.POST, { headers: bearer(token), body: largestRun() });
    // The first request reaches the pool after its token and body are read: wait for that.
    while (tasksInFlight(t.members.viewer.id) === 0) await new Promise((r) => setTimeout(r, 5));
    const second = await callText(runsRoute.POST, { headers: bearer(token), body: demo });
    expect(second.status).toBe(429);
    expect(second.headers.get("retry-after")).toMatch(/^\d+$/);
    const error = JSON.parse(second.text).error;
    expect(error.code).toBe("rate-limited:compute");
    expect(error.message).toMatch(/^You already have 1 calculations running; wait for one/);
    // Another person is not held by the first one's cap.
    const other = await callText(runsRoute.POST, { headers: bearer(otherToken), body: demo });
    expect(other.status).toBe(200);
    expect((await first).status).toBe(422);
    // Once the first has ended, the cap is free again.
    const again = await callText(runsRoute.POST, { headers: bearer(token), body: demo });
    expect(again.status).toBe(200);
  });
});

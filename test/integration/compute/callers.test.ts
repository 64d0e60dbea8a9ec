/**
 * Every request-thread caller of the core and of the CSV reader goes through the compute pool:
 * with the person's one slot held by a long task, the caller answers 429 with Retry-After (the
 * pool's gate) instead of doing the work on the request thread. Once the slot is free the same
 * request succeeds, so the 429 is the gate's and nothing else's.
 */
import JSZip from "jszip";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import * as identifyRoute from "@/app/api/v1/teams/[team]/fits/identify/route";
import * as fitsRoute from "@/app/api/v1/teams/[team]/fits/route";
import * as recordsRoute from "@/app/api/v1/teams/[team]/test-records/route";
import * as bundleRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/bundle/route";
import * as checksRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/conformance/route";
import { closeComputePool, startTask, tasksInFlight } from "@/lib/server/compute/pool";
import { ComputeBusy } from "@/lib/server/compute/errors";
import { loadCalibrationReport } from "@/lib/server/handoff/report/load-report";
import { uploadTestRecord } from "@/lib/server/records/upload";

import { openTestDb, unique } from "../support/db";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  DEMO_FILE,
  makeWorld,
  type CallResult,
  type World,
} from "../support/workspace";
import { bearer, tokenFor } from "../api/support";
import { DEMO_CSV, recordCount, uploadBody } from "../records/support";

process.env.COMPUTE_MAX_TASKS_PER_PERSON = "1";

const db = openTestDb();
closeAppPoolAfterAll();
afterAll(closeComputePool);

/** Holds `person`'s only slot with a run far longer than any test; `release` stops it. */
function holdSlot(person: string) {
  const scenario = structuredClone(DEMO_FILE) as Record<string, unknown> & typeof DEMO_FILE;
  scenario.path.legs = [
    { control: ["strain", "stress", "stress"], target: [0.012, 0, 0], increments: 500_000 },
    { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 500_000 },
  ];
  const task = startTask<null>(
    { kind: "run", request: { scenario, setId: null, format: "csv" } },
    person,
    "run",
  );
  task.done.catch(() => undefined);
  expect(tasksInFlight(person)).toBe(1);
  return async () => {
    task.cancel();
    await task.done.catch(() => undefined);
  };
}

/** The answer while the slot is held, then the answer once it is free again. */
async function whileHeldThenFree(
  person: string,
  call: () => Promise<CallResult>,
): Promise<{ held: CallResult; free: CallResult }> {
  const release = holdSlot(person);
  let held: CallResult;
  try {
    held = await call();
  } finally {
    await release();
  }
  expect(tasksInFlight(person)).toBe(0);
  return { held, free: await call() };
}

function expectBusy(res: CallResult): void {
  expect(res.status).toBe(429);
  expect(res.headers.get("retry-after")).toMatch(/^\d+$/);
  expect(res.body.error.code).toBe("rate-limited:compute");
  expect(res.body.error.message).toMatch(/^You already have 1 calculations running; wait/);
}

let w: World;
let editorToken: string;

beforeAll(async () => {
  w = await makeWorld(db);
  editorToken = (await tokenFor(db, w.members.editor, w.slug, "editor")).token;
});

const HISTORY = "eps11,eps22,gam12,sig11,sig22,sig12\n0,0,0,0,0,0\n0.001,0,0,10,0,0\n";

describe("request-thread callers go through the compute pool", () => {
  it("conformance check: recording one waits for the pool", async () => {
    const { held, free } = await whileHeldThenFree(w.members.editor.id, () =>
      callRoute(checksRoute.POST, {
        method: "POST",
        params: { team: w.slug, scenario: w.scenarioId, number: "1" },
        headers: bearer(editorToken),
        body: { fileName: "fe.csv", text: HISTORY },
      }),
    );
    expectBusy(held);
    expect(free.status).toBe(201);
    expect(free.body.result.points).toBe(2);
  });

  it("test-record upload: the CSV is read in the pool, and a busy pool saves nothing", async () => {
    const cookie = (await cookieFor(db, w.members.editor))!;
    const before = await recordCount(db, w.teamId);
    const upload = () =>
      callRoute(recordsRoute.POST, {
        method: "POST",
        params: { team: w.slug },
        cookie,
        body: uploadBody(DEMO_CSV),
      });
    const { held, free } = await whileHeldThenFree(w.members.editor.id, upload);
    expectBusy(held);
    expect(free.status).toBe(201);
    expect(free.body.pointCount).toBe(DEMO_CSV.trim().split("\n").length - 1);
    expect(await recordCount(db, w.teamId)).toBe(before + 1);
  });

  it("fit save: the records are replayed in the pool", async () => {
    const record = await uploadTestRecord(db, w.members.editor, w.slug, uploadBody(DEMO_CSV));
    const cookie = (await cookieFor(db, w.members.editor))!;
    const save = () =>
      callRoute(fitsRoute.POST, {
        method: "POST",
        params: { team: w.slug },
        cookie,
        body: { method: "identify", recordIds: [record.id], name: unique("Fitted") },
      });
    const { held, free } = await whileHeldThenFree(w.members.editor.id, save);
    expectBusy(held);
    expect(free.status).toBe(201);
    expect(free.body.residuals).toHaveLength(1);
    expect(free.body.residuals[0]).toMatchObject({ id: record.id });
    expect(free.body.residuals[0].rms).toBeGreaterThan(0);
  });

  it("identification: the loops are fitted in the pool", async () => {
    const record = await uploadTestRecord(db, w.members.editor, w.slug, uploadBody(DEMO_CSV));
    const cookie = (await cookieFor(db, w.members.editor))!;
    const run = () =>
      callRoute(identifyRoute.POST, {
        method: "POST",
        params: { team: w.slug },
        cookie,
        body: { recordIds: [record.id] },
      });
    const { held, free } = await whileHeldThenFree(w.members.editor.id, run);
    expectBusy(held);
    expect(free.status).toBe(200);
    expect(free.body.records[0].loops.length).toBeGreaterThan(0);
  });

  it("calibration report: the curves are computed in the pool", async () => {
    const viewer = w.members.viewer;
    const release = holdSlot(viewer.id);
    let refusal: unknown;
    try {
      await loadCalibrationReport(db, viewer, w.slug, w.scenarioId, 1).catch((e) => {
        refusal = e;
      });
    } finally {
      await release();
    }
    expect(refusal).toBeInstanceOf(ComputeBusy);
    expect((refusal as ComputeBusy).code).toBe("rate-limited:compute");
    expect((refusal as ComputeBusy).retryAfterSeconds).toBeGreaterThan(0);
    const report = await loadCalibrationReport(db, viewer, w.slug, w.scenarioId, 1);
    const setIds = DEMO_FILE.parameterSets.map((s) => s.id);
    expect(report.skipped).toEqual([]);
    expect(report.statuses.map((s) => s.setId)).toEqual(setIds);
    expect(report.charts.stressStrain.paths.map((p) => p.name)).toEqual(setIds);
    expect(report.charts.tension.paths).toHaveLength(setIds.length);
  });

  it("reference bundle: the standard load cases run in the pool", async () => {
    const viewer = w.members.viewer;
    const viewerToken = (await tokenFor(db, viewer, w.slug, "viewer")).token;
    const fetchBundle = () =>
      bundleRoute.GET(new Request("http://app.test/x", { headers: bearer(viewerToken) }), {
        params: Promise.resolve({ team: w.slug, scenario: w.scenarioId, number: "1" }),
      });
    const release = holdSlot(viewer.id);
    let held: Response;
    try {
      held = await fetchBundle();
    } finally {
      await release();
    }
    expect(held.status).toBe(429);
    expect(held.headers.get("retry-after")).toMatch(/^\d+$/);
    expect((await held.json()).error.code).toBe("rate-limited:compute");

    const free = await fetchBundle();
    expect(free.status).toBe(200);
    expect(free.headers.get("content-type")).toBe("application/zip");
    const zip = await JSZip.loadAsync(await free.arrayBuffer());
    const curves = Object.keys(zip.files).filter((name) => name.endsWith(".csv"));
    // Six standard cases per set (load-cases.ts), each with its curve.
    expect(curves).toHaveLength(6 * DEMO_FILE.parameterSets.length);
  });
});

import JSZip from "jszip";
import type PgBoss from "pg-boss";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import * as resultsRoute from "@/app/api/v1/teams/[team]/studies/[study]/results/route";
import * as studyRoute from "@/app/api/v1/teams/[team]/studies/[study]/route";
import * as studiesRoute from "@/app/api/v1/teams/[team]/studies/route";
import { requireDatabaseUrl } from "@/db/client";
import { runPath } from "@/lib/mechanics/driver";
import type { PathRunner } from "@/lib/scenario/run-scenario-file";
import { toMaterialParams } from "@/lib/scenario/parameter-set-schema";
import { resultsToCsv } from "@/lib/scenario/results-csv";
import { listStudiesForTeam, listStudyResults } from "@/db/queries/studies";
import { openStudyQueue } from "@/lib/server/handoff/studies/queue";
import { getStudy, submitStudy } from "@/lib/server/handoff/studies/service";
import { startStudyWorker } from "@/lib/server/handoff/studies/worker";

import { openTestDb } from "../support/db";
import { makeTeamWithAllRoles, type TeamFixture } from "../support/team";
import { callRoute, closeAppPoolAfterAll, DEMO_FILE } from "../support/workspace";
import { bearer, tokenFor } from "./support";

const db = openTestDb();
closeAppPoolAfterAll();

// Two queue handles with their own pools stand for two app instances.
let a: PgBoss;
let b: PgBoss;
let t: TeamFixture;
/** The 100-set study of the first test, downloaded by the last. */
let hundredSetStudy = "";

beforeAll(async () => {
  a = await openStudyQueue(requireDatabaseUrl(), { retryLimit: 2, retryDelay: 0 });
  b = await openStudyQueue(requireDatabaseUrl(), { retryLimit: 2, retryDelay: 0 });
  t = await makeTeamWithAllRoles(db);
});

afterAll(async () => {
  await Promise.all([
    a?.stop({ graceful: false, wait: true }),
    b?.stop({ graceful: false, wait: true }),
  ]);
});

async function untilFinished(studyId: string) {
  for (;;) {
    const study = await getStudy(db, t.members.editor, t.slug, studyId);
    if (study.done + study.failed === study.total) return study;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

const grid = (axes: unknown[]) => ({ name: "grid", scenario: DEMO_FILE, grid: { axes } });

describe("parameter studies on the queue", () => {
  it("runs a 100-set grid with two workers sharing the jobs; each set equals its single run", async () => {
    const ran = { a: 0, b: 0 };
    let releaseA: () => void = () => {};
    const bDidOne = new Promise<void>((resolve) => (releaseA = resolve));
    const counting =
      (who: "a" | "b"): PathRunner =>
      (params, legs) => {
        ran[who]++;
        return runPath(params, legs);
      };
    // Worker a holds its first job until worker b has finished one: both must take part.
    const workerA = await startStudyWorker(a, db, {
      runner: counting("a"),
      pollingIntervalSeconds: 0.5,
      beforeJob: async () => (ran.a === 0 ? bDidOne : undefined),
    });
    const workerB = await startStudyWorker(b, db, {
      runner: (params, legs) => {
        const result = counting("b")(params, legs);
        releaseA();
        return result;
      },
      pollingIntervalSeconds: 0.5,
    });
    const body = grid([
      { parameter: "Y0_1", from: 0.03, to: 0.08, count: 10 },
      { parameter: "a1", values: [0.4, 0.45, 0.5, 0.55, 0.6, 0.65, 0.7, 0.75, 0.8, 0.9] },
    ]);
    const submitted = await submitStudy(db, async () => a, t.members.editor, t.slug, body);
    expect(submitted.total).toBe(100);
    hundredSetStudy = submitted.id;
    const study = await untilFinished(submitted.id);
    await Promise.all([a.offWork({ id: workerA }), b.offWork({ id: workerB })]);
    expect(study).toMatchObject({ done: 100, failed: 0, state: "done" });
    expect(ran.a).toBeGreaterThan(0);
    expect(ran.b).toBeGreaterThan(0);
    const rows = await listStudyResults(db, submitted.id);
    const distinct = new Set(rows.map((r) => r.csv));
    expect(distinct.size).toBe(100);
    for (const row of rows) {
      const single = runPath(toMaterialParams(row.set), DEMO_FILE.path.legs as never);
      expect(row.csv).toBe(resultsToCsv(single.columns, single.rows));
    }
  }, 180_000);

  it("retries a crashing set, then marks it failed with its reason; a one-off crash recovers", async () => {
    let flaky = true;
    const crashing: PathRunner = (params, legs) => {
      if (params.a1 === 0.5) throw new Error("solver exploded on purpose");
      if (params.a1 === 0.6 && flaky) {
        flaky = false;
        throw new Error("a passing hiccup");
      }
      return runPath(params, legs);
    };
    const ids = await Promise.all(
      [a, b].map((q) => startStudyWorker(q, db, { runner: crashing, pollingIntervalSeconds: 0.5 })),
    );
    const body = grid([{ parameter: "a1", values: [0.4, 0.5, 0.6] }]);
    const submitted = await submitStudy(db, async () => b, t.members.editor, t.slug, body);
    const study = await untilFinished(submitted.id);
    await Promise.all([a.offWork({ id: ids[0] }), b.offWork({ id: ids[1] })]);
    expect(study).toMatchObject({ done: 2, failed: 1, state: "finished with failures" });
    const listed = (await listStudiesForTeam(db, t.teamId)).find((s) => s.id === submitted.id);
    expect(listed).toMatchObject({ total: 3, done: 2, failed: 1 });
    const failed = study.items.find((i) => i.state === "failed")!;
    expect(failed).toMatchObject({ setId: "g2", error: "solver exploded on purpose", attempts: 3 });
    expect(study.items.find((i) => i.setId === "g3")).toMatchObject({ state: "done", attempts: 2 });
  }, 180_000);

  it("checks roles and ids at the routes, and answers bad designs with 4xx", async () => {
    const other = await makeTeamWithAllRoles(db);
    const viewer = (await tokenFor(db, t.members.viewer, t.slug, "viewer")).token;
    const editor = (await tokenFor(db, t.members.editor, t.slug, "editor")).token;
    const post = (token: string, body: unknown, team = t.slug) =>
      callRoute(studiesRoute.POST, {
        method: "POST",
        params: { team },
        headers: bearer(token),
        body,
      });
    expect((await post(viewer, grid([{ parameter: "a1", values: [0.5] }]))).status).toBe(403);
    expect(
      (await post(editor, grid([{ parameter: "a1", values: [0.5] }]), other.slug)).status,
    ).toBe(404);
    const outOfRange = await post(editor, grid([{ parameter: "a1", values: [-1] }]));
    expect(outOfRange.status).toBe(422);
    expect(outOfRange.body.error.message).toContain("a1");
    const tooMany = await post(
      editor,
      grid([
        { parameter: "a1", from: 0.1, to: 0.9, count: 1000 },
        { parameter: "b", from: 0.1, to: 0.5, count: 2 },
      ]),
    );
    expect(tooMany.status).toBe(413);
    const unknown = await post(editor, grid([{ parameter: "nope", values: [1] }]));
    expect(unknown.status).toBe(400);
    const forged = { team: t.slug, study: "00000000-0000-0000-0000-000000000000" };
    expect(
      (await callRoute(studyRoute.GET, { params: forged, headers: bearer(viewer) })).status,
    ).toBe(404);
  });

  it("zips a finished study's results for download", async () => {
    const viewer = (await tokenFor(db, t.members.viewer, t.slug, "viewer")).token;
    const res = await resultsRoute.GET(
      new Request("http://app.test/x", { headers: bearer(viewer) }),
      {
        params: Promise.resolve({ team: t.slug, study: hundredSetStudy }),
      },
    );
    expect(res.status).toBe(200);
    const zip = await JSZip.loadAsync(await res.arrayBuffer());
    expect(Object.keys(zip.files).filter((f) => /^sets\/.+\.csv$/.test(f))).toHaveLength(100);
    expect(await zip.file("summary.csv")!.async("string")).toContain(",g100,");
    expect(await zip.file("README.txt")!.async("string")).toContain("no design allowable");
  });
});

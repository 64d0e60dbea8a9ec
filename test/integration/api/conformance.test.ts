import { execFileSync } from "node:child_process";

import { beforeAll, describe, expect, it } from "vitest";

import * as csvRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/conformance/[check]/csv/route";
import * as checksRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/conformance/route";

import { openTestDb } from "../support/db";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  makeWorld,
  type World,
} from "../support/workspace";
import { bearer, callText, tokenFor } from "./support";

const db = openTestDb();
closeAppPoolAfterAll();

let w: World;
let other: World;
let driverCsv: string;
let editorToken: string;

beforeAll(async () => {
  w = await makeWorld(db);
  other = await makeWorld(db);
  editorToken = (await tokenFor(db, w.members.editor, w.slug, "editor")).token;
  driverCsv = execFileSync(
    "npm",
    ["run", "--silent", "drive", "--", "test/fixtures/demo-scenario.json"],
    {
      encoding: "utf8",
    },
  );
});

function perturbed(column: string, from: number, delta: number): string {
  const [header, ...rows] = driverCsv.trim().split("\n");
  const index = header.split(",").indexOf(column);
  return [
    header,
    ...rows.map((line) => {
      const cells = line.split(",");
      if (Number(cells[0]) >= from) cells[index] = String(Number(cells[index]) + delta);
      return cells.join(",");
    }),
  ].join("\n");
}

const params = () => ({ team: w.slug, scenario: w.scenarioId, number: "1" });
const upload = (text: string, headers: Record<string, string>, p = params()) =>
  callRoute(checksRoute.POST, {
    method: "POST",
    params: p,
    headers,
    body: { fileName: "fe.csv", text },
  });

describe("conformance checks on a revision", () => {
  it("passes a history written by the command-line driver and records it on the revision", async () => {
    const res = await upload(driverCsv, bearer(editorToken));
    expect(res.status).toBe(201);
    expect(res.body.passed).toBe(true);
    expect(res.body.result.quantities).toHaveLength(5);
    const list = await callRoute(checksRoute.GET, {
      params: params(),
      headers: bearer(editorToken),
    });
    expect(list.body.items[0]).toMatchObject({ id: res.body.id, passed: true, fileName: "fe.csv" });
    const csv = await callText(csvRoute.GET, {
      method: "GET",
      params: { ...params(), check: res.body.id },
      headers: bearer(editorToken),
    });
    expect(csv.status).toBe(200);
    expect(csv.text).toContain(": PASS");
    expect(csv.text).toContain("no design allowable");
    expect(csv.text).toContain("sig11_uploaded,sig11_craquelure,sig11_difference");
  });

  it("fails at the increment from which one column is perturbed", async () => {
    const res = await upload(perturbed("sig22", 180, 5), bearer(editorToken));
    expect(res.status).toBe(201);
    expect(res.body.passed).toBe(false);
    expect(res.body.firstFailIncrement).toBe(180);
    const sig22 = res.body.result.quantities.find(
      (q: { quantity: string }) => q.quantity === "sig22",
    );
    expect(sig22).toMatchObject({ passed: false, firstFailIncrement: 180 });
  });

  it("answers a malformed CSV with 422 naming line and cell, and saves nothing", async () => {
    const before = await callRoute(checksRoute.GET, {
      params: params(),
      headers: bearer(editorToken),
    });
    const bad = await upload(
      "eps11,eps22,gam12,sig11,sig22,sig12\n0,0,0,0,0,0\n0.001,oops,0,1,0,0\n",
      bearer(editorToken),
    );
    expect(bad.status).toBe(422);
    expect(bad.body.error).toMatchObject({ code: "invalid:csv", line: 3, column: "eps22" });
    const after = await callRoute(checksRoute.GET, {
      params: params(),
      headers: bearer(editorToken),
    });
    expect(after.body.items.length).toBe(before.body.items.length);
  });

  it("needs scenario:edit to record, and answers 404 for another team's revision", async () => {
    const viewer = await cookieFor(db, w.members.viewer);
    expect((await upload(driverCsv, { cookie: viewer! })).status).toBe(403);
    const viewerToken = (await tokenFor(db, w.members.owner, w.slug, "viewer")).token;
    expect((await upload(driverCsv, bearer(viewerToken))).status).toBe(403);
    const foreign = { team: w.slug, scenario: other.scenarioId, number: "1" };
    expect((await upload(driverCsv, bearer(editorToken), foreign)).status).toBe(404);
    const forged = { ...params(), check: "00000000-0000-0000-0000-000000000000" };
    const res = await callText(csvRoute.GET, {
      method: "GET",
      params: forged,
      headers: bearer(editorToken),
    });
    expect(res.status).toBe(404);
  });
});

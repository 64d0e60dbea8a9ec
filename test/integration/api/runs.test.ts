import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";

import { beforeAll, describe, expect, it } from "vitest";

import * as runsRoute from "@/app/api/v1/runs/route";
import { runPath } from "@/lib/mechanics/driver";
import { runDriveCommand } from "@/lib/scenario/drive-command";

import { openTestDb } from "../support/db";
import { makeTeamWithAllRoles, type TeamFixture } from "../support/team";
import { closeAppPoolAfterAll, cookieFor } from "../support/workspace";
import { bearer, callText, tokenFor } from "./support";

const db = openTestDb();
closeAppPoolAfterAll();

const FIXTURE = "test/fixtures/demo-scenario.json";
const demo = JSON.parse(readFileSync(path.join(process.cwd(), FIXTURE), "utf8"));

function drive(...args: string[]): string {
  return execFileSync("npm", ["run", "--silent", "drive", "--", FIXTURE, ...args], {
    encoding: "utf8",
    maxBuffer: 64 * 1024 * 1024,
  });
}

let t: TeamFixture;
let token: string;

beforeAll(async () => {
  t = await makeTeamWithAllRoles(db);
  token = (await tokenFor(db, t.members.viewer, t.slug, "viewer")).token;
});

describe("POST /api/v1/runs", () => {
  it("answers the command line's CSV byte for byte, with a viewer's token", async () => {
    const res = await callText(runsRoute.POST, { headers: bearer(token), body: demo });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(res.text).toBe(drive());
  });

  it("answers the command line's JSON for a chosen set (wrapper form and Accept header)", async () => {
    const setId = demo.parameterSets.at(-1).id ?? "A";
    const wrapped = await callText(runsRoute.POST, {
      headers: bearer(token),
      body: { scenario: demo, set: setId, format: "json" },
    });
    expect(wrapped.status).toBe(200);
    const expected = drive("--set", setId, "--format", "json");
    expect(wrapped.text).toBe(expected);
    const accepted = await callText(runsRoute.POST, {
      url: `http://app.test/api/v1/runs?set=${encodeURIComponent(setId)}`,
      headers: { ...bearer(token), accept: "application/json" },
      body: demo,
    });
    expect(accepted.text).toBe(expected);
  });

  it("streams a run of many chunks without losing or reordering a byte", async () => {
    const long = structuredClone(demo);
    long.path.legs = [
      { control: ["strain", "stress", "stress"], target: [0.012, 0, 0], increments: 12_000 },
      { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 8_000 },
    ];
    const res = await callText(runsRoute.POST, { headers: bearer(token), body: long });
    expect(res.status).toBe(200);
    let expected = "";
    runDriveCommand(
      ["long.json"],
      {
        readFile: () => JSON.stringify(long),
        stdout: (t) => void (expected += t),
        stderr: () => {},
      },
      runPath,
    );
    expect(res.text.split("\n")).toHaveLength(20_003);
    expect(res.text).toBe(expected);
  });

  it("runs for a signed-in session too, and refuses anonymous callers with 401", async () => {
    const cookie = (await cookieFor(db, t.members.editor)) as string;
    const withSession = await callText(runsRoute.POST, { headers: { cookie }, body: demo });
    expect(withSession.status).toBe(200);
    const anonymous = await callText(runsRoute.POST, { body: demo });
    expect(anonymous.status).toBe(401);
    expect(JSON.parse(anonymous.text).error.code).toBe("unauthenticated");
  });

  it("answers 413 with a message beyond 1,000,000 increments", async () => {
    const big = structuredClone(demo);
    big.path.legs[0].increments = 1_000_001;
    const res = await callText(runsRoute.POST, { headers: bearer(token), body: big });
    expect(res.status).toBe(413);
    expect(JSON.parse(res.text).error.message).toMatch(/1,000,000/);
  });

  it("answers 422 naming the field for an invalid file, and for an unknown set", async () => {
    const bad = structuredClone(demo);
    bad.parameterSets[0].a1 = -1;
    const res = await callText(runsRoute.POST, { headers: bearer(token), body: bad });
    expect(res.status).toBe(422);
    expect(JSON.parse(res.text).error.message).toContain("parameterSets[0].a1");
    const noSet = await callText(runsRoute.POST, {
      headers: bearer(token),
      body: { scenario: demo, set: "no-such-set" },
    });
    expect(noSet.status).toBe(422);
    expect(noSet.text).not.toMatch(/at .*\.ts:\d+/);
  });

  it("answers 400 for a body that is not JSON and 401 for a malformed Authorization header", async () => {
    const request = new Request("http://app.test/api/v1/runs", {
      method: "POST",
      headers: bearer(token),
      body: "{ not json",
    });
    const res = await runsRoute.POST(request, { params: Promise.resolve({}) });
    expect(res.status).toBe(400);
    const malformed = await callText(runsRoute.POST, {
      headers: { authorization: "Bearer nonsense" },
      body: demo,
    });
    expect(malformed.status).toBe(401);
  });
});

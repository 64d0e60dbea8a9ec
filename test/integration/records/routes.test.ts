import { beforeAll, describe, expect, it } from "vitest";

import * as fitRoute from "@/app/api/v1/teams/[team]/fits/[fit]/route";
import * as identifyRoute from "@/app/api/v1/teams/[team]/fits/identify/route";
import * as fitsRoute from "@/app/api/v1/teams/[team]/fits/route";
import * as fileRoute from "@/app/api/v1/teams/[team]/test-records/[record]/file/route";
import * as recordRoute from "@/app/api/v1/teams/[team]/test-records/[record]/route";
import * as recordsRoute from "@/app/api/v1/teams/[team]/test-records/route";
import type { Role } from "@/lib/shared/permissions";
import { saveFit } from "@/lib/server/records/save-fit";
import { uploadTestRecord } from "@/lib/server/records/upload";

import { openTestDb, unique } from "../support/db";
import { makeTeamWithAllRoles, type TeamFixture } from "../support/team";
import { callRoute, closeAppPoolAfterAll, cookieFor } from "../support/workspace";
import { DEMO_CSV, recordCount, uploadBody } from "./support";

const db = openTestDb();
closeAppPoolAfterAll();

let t: TeamFixture;
let other: TeamFixture;
let recordId: string;
let fitId: string;
let foreignRecord: string;

beforeAll(async () => {
  t = await makeTeamWithAllRoles(db);
  other = await makeTeamWithAllRoles(db);
  recordId = (await uploadTestRecord(db, t.members.editor, t.slug, uploadBody(DEMO_CSV))).id;
  foreignRecord = (
    await uploadTestRecord(db, other.members.owner, other.slug, uploadBody(DEMO_CSV))
  ).id;
  fitId = (
    await saveFit(db, t.members.editor, t.slug, {
      method: "identify",
      recordIds: [recordId],
      name: unique("Fitted"),
    })
  ).id;
});

type Who = Role | "outsider" | "anonymous";
const actorOf = (who: Who) =>
  who === "anonymous" ? null : who === "outsider" ? t.outsider : t.members[who];

async function call(who: Who, handler: unknown, method: string, params: object, body?: unknown) {
  const cookie = await cookieFor(db, actorOf(who));
  if (handler === fileRoute.GET) {
    // The download is a CSV, not JSON: only its status matters here.
    const headers: Record<string, string> = cookie ? { cookie } : {};
    const res = await fileRoute.GET(new Request("http://app.test/x", { headers }), {
      params: Promise.resolve({ team: t.slug, ...params } as { team: string; record: string }),
    });
    return { status: res.status, body: null };
  }
  return callRoute(handler, { method, params: { team: t.slug, ...params }, cookie, body });
}

const READS: [string, unknown, () => object][] = [
  ["GET test-records", recordsRoute.GET, () => ({})],
  ["GET test-record", recordRoute.GET, () => ({ record: recordId })],
  ["GET file", fileRoute.GET, () => ({ record: recordId })],
  ["GET fits", fitsRoute.GET, () => ({})],
  ["GET fit", fitRoute.GET, () => ({ fit: fitId })],
];

describe("reads: every member; outsider 404; anonymous 401", () => {
  for (const [label, handler, params] of READS) {
    it(label, async () => {
      for (const who of ["owner", "editor", "reviewer", "viewer"] as const) {
        expect((await call(who, handler, "GET", params())).status, who).toBe(200);
      }
      expect((await call("outsider", handler, "GET", params())).status).toBe(404);
      expect((await call("anonymous", handler, "GET", params())).status).toBe(401);
    });
  }
});

describe("writes: owner and editor; reviewer and viewer 403; outsider 404; anonymous 401", () => {
  const expected: Record<Who, number> = {
    owner: 201,
    editor: 201,
    reviewer: 403,
    viewer: 403,
    outsider: 404,
    anonymous: 401,
  };
  for (const who of Object.keys(expected) as Who[]) {
    it(`upload and save fit as ${who}`, async () => {
      const before = await recordCount(db, t.teamId);
      const up = await call(who, recordsRoute.POST, "POST", {}, uploadBody(DEMO_CSV));
      expect(up.status).toBe(expected[who]);
      expect(await recordCount(db, t.teamId)).toBe(before + (up.status === 201 ? 1 : 0));
      const save = { method: "identify", recordIds: [recordId], name: unique("Set") };
      expect((await call(who, fitsRoute.POST, "POST", {}, save)).status).toBe(expected[who]);
      const identify = await call(who, identifyRoute.POST, "POST", {}, { recordIds: [recordId] });
      expect(identify.status).toBe(expected[who] === 201 ? 200 : expected[who]);
    });
  }
});

describe("another team's ids are not found", () => {
  it("record, file, identify and fit", async () => {
    expect((await call("owner", recordRoute.GET, "GET", { record: foreignRecord })).status).toBe(
      404,
    );
    expect((await call("owner", fileRoute.GET, "GET", { record: foreignRecord })).status).toBe(404);
    const body = { recordIds: [foreignRecord] };
    expect((await call("owner", identifyRoute.POST, "POST", {}, body)).status).toBe(404);
    expect((await call("owner", recordRoute.GET, "GET", { record: "not-a-uuid" })).status).toBe(
      404,
    );
  });

  it("a malformed upload answers 422 (as every route does for invalid:csv) with the line and cell and no stack", async () => {
    const bad = uploadBody("strain,stress\n0.001,10\n0.002,x\n");
    const res = await call("editor", recordsRoute.POST, "POST", {}, bad);
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: "invalid:csv", line: 3, column: "stress" });
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
  });

  it("the file download returns the original bytes", async () => {
    const cookie = await cookieFor(db, t.members.viewer);
    const res = await (fileRoute.GET as (r: Request, c: unknown) => Promise<Response>)(
      new Request("http://app.test/x", { headers: { cookie: cookie! } }),
      { params: Promise.resolve({ team: t.slug, record: recordId }) },
    );
    expect(res.headers.get("content-disposition")).toContain("demo-cyclic-tension.csv");
    expect(await res.text()).toBe(DEMO_CSV);
  });
});

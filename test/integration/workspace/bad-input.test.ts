import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import * as setsRoute from "@/app/api/v1/teams/[team]/parameter-sets/route";
import * as commentsRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/comments/route";
import * as reviewRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/review/route";
import * as revisionsRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/route";
import * as scenariosRoute from "@/app/api/v1/teams/[team]/scenarios/route";
import { scenarioRevisions, scenarios } from "@/db/schema/scenarios";

import { openTestDb } from "../support/db";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  DEMO_FILE,
  demoFileWith,
  makeWorld,
  SET_VALUES,
} from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

async function counts(teamId: string, scenarioId: string) {
  const [[s], [r]] = await Promise.all([
    db.select({ n: count() }).from(scenarios).where(eq(scenarios.teamId, teamId)),
    db
      .select({ n: count() })
      .from(scenarioRevisions)
      .where(eq(scenarioRevisions.scenarioId, scenarioId)),
  ]);
  return { scenarios: s.n, revisions: r.n };
}

describe("bad input gets a clear 4xx JSON error and saves nothing", () => {
  it("refuses invalid scenario files, bodies that are not JSON, and oversized bodies", async () => {
    const w = await makeWorld(db);
    const cookie = await cookieFor(db, w.members.editor);
    const team = { team: w.slug };
    const rev = { team: w.slug, scenario: w.scenarioId };
    const before = await counts(w.teamId, w.scenarioId);

    const badSet = structuredClone(DEMO_FILE);
    badSet.parameterSets[0].E1 = -5;
    const cases = [
      {
        handler: scenariosRoute.POST,
        params: team,
        body: { name: "x", file: badSet },
        status: 422,
        code: "invalid:file",
        path: "file",
        message: /parameterSets\[0\]\.E1/,
      },
      {
        handler: scenariosRoute.POST,
        params: team,
        body: { name: "x", file: { format: "other/2" } },
        status: 422,
        code: "invalid:file",
        path: "file",
        message: /format/,
      },
      {
        handler: scenariosRoute.POST,
        params: team,
        body: { name: "x", file: [1, 2] },
        status: 422,
        code: "invalid:file",
        path: "file",
        message: /JSON object/,
      },
      {
        handler: scenariosRoute.POST,
        params: team,
        body: { name: "", file: DEMO_FILE },
        status: 400,
        code: "invalid:name",
        path: "name",
        message: /name/,
      },
      {
        handler: scenariosRoute.POST,
        params: team,
        body: { name: "x", tags: "plate", file: DEMO_FILE },
        status: 400,
        code: "invalid:tags",
        path: "tags",
        message: /list/,
      },
      {
        handler: revisionsRoute.POST,
        params: rev,
        body: { file: DEMO_FILE },
        status: 400,
        code: "invalid:baseRevision",
        path: "baseRevision",
        message: /baseRevision/,
      },
      {
        handler: revisionsRoute.POST,
        params: rev,
        body: { baseRevision: 1, file: { ...DEMO_FILE, path: { legs: [] } } },
        status: 422,
        code: "invalid:file",
        path: "file",
        message: /path\.legs/,
      },
      {
        handler: revisionsRoute.POST,
        params: rev,
        rawBody: "{not json",
        status: 400,
        code: "invalid:json",
        message: /not valid JSON/,
      },
      {
        handler: revisionsRoute.POST,
        params: rev,
        rawBody: "",
        status: 400,
        code: "invalid:body",
        message: /JSON body/,
      },
      {
        handler: revisionsRoute.POST,
        params: rev,
        rawBody: JSON.stringify({
          baseRevision: 1,
          file: demoFileWith(12000, { pad: "x".repeat(5 * 1024 * 1024) }),
        }),
        status: 413,
        code: "invalid:too-large",
        message: /takes at most 4 MB/,
      },
      {
        handler: setsRoute.POST,
        params: team,
        body: { name: "s", values: { ...SET_VALUES, E1: "big" } },
        status: 400,
        code: "invalid:values",
        path: "values.E1",
        message: /values\.E1: must be a number/,
      },
      {
        handler: setsRoute.POST,
        params: team,
        body: { name: "s", values: { ...SET_VALUES, bogus: 1 } },
        status: 400,
        code: "invalid:values",
        path: "values",
        message: /values\.bogus: unknown field/,
      },
      {
        handler: commentsRoute.POST,
        params: { ...rev, number: "1" },
        body: { body: "  " },
        status: 400,
        code: "invalid:body",
        path: "body",
        message: /Write something/,
      },
      {
        handler: commentsRoute.POST,
        params: { ...rev, number: "1" },
        body: { body: "x", increment: 10_000 },
        status: 400,
        code: "invalid:increment",
        path: "increment",
        message: /250 increments/,
      },
      {
        handler: commentsRoute.POST,
        params: { ...rev, number: "1" },
        body: { body: "x", parentId: "nope" },
        status: 400,
        code: "invalid:parentId",
        path: "parentId",
        message: /Unknown comment/,
      },
      {
        handler: reviewRoute.POST,
        params: { ...rev, number: "1" },
        body: { action: "approve-all" },
        status: 400,
        code: "invalid:action",
        path: "action",
        message: /Unknown review action/,
      },
    ];
    for (const c of cases) {
      const r = await callRoute(c.handler, {
        method: "POST",
        params: c.params,
        cookie,
        body: c.body,
        rawBody: c.rawBody,
      });
      const label = `${c.code} ${JSON.stringify(r.body)}`;
      expect(r.status, label).toBe(c.status);
      expect(r.body.error.code, label).toBe(c.code);
      expect(r.body.error.message, label).toMatch(c.message);
      if (c.path) expect(r.body.error.path, label).toBe(c.path);
    }
    expect(await counts(w.teamId, w.scenarioId)).toEqual(before);
  });

  it("refuses a bad list query with 400, and pages past the end with an empty page", async () => {
    const w = await makeWorld(db);
    const cookie = await cookieFor(db, w.members.viewer);
    for (const query of [
      "?sort=colour",
      "?page=0",
      "?pageSize=1000",
      "?review=maybe",
      "?author=bob",
    ]) {
      const r = await callRoute(scenariosRoute.GET, {
        url: `http://app.test/x${query}`,
        params: { team: w.slug },
        cookie,
      });
      expect(r.status, query).toBe(400);
      expect(r.body.error.code).toMatch(/^invalid:/);
    }
    const far = await callRoute(scenariosRoute.GET, {
      url: "http://app.test/x?page=999",
      params: { team: w.slug },
      cookie,
    });
    expect(far.body).toMatchObject({ items: [], total: 1, page: 999 });
  });

  it("a stale or forged session cookie is simply anonymous (401) and is cleared", async () => {
    const w = await makeWorld(db);
    const r = await callRoute(scenariosRoute.GET, {
      params: { team: w.slug },
      cookie: "craq_session=forged-session-id",
    });
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe("unauthenticated");
    expect(r.headers.get("set-cookie")).toMatch(/craq_session=;/);
  });
});

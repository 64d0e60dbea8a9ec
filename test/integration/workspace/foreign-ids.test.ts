import { describe, expect, it } from "vitest";

import * as setRoute from "@/app/api/v1/teams/[team]/parameter-sets/[set]/route";
import * as diffRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/diff/route";
import * as commentRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/comments/[comment]/route";
import * as commentsRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/comments/route";
import * as reviewRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/review/route";
import * as revisionRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/route";
import * as createLinkRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/share-links/route";
import * as revisionsRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/route";
import * as scenarioRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/route";
import * as linkRoute from "@/app/api/v1/teams/[team]/share-links/[link]/route";
import * as linksRoute from "@/app/api/v1/teams/[team]/share-links/route";

import { openTestDb } from "../support/db";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  demoFileWith,
  makeWorld,
  type World,
} from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

interface IdCase {
  handler: unknown;
  method: string;
  params: (mine: World, theirs: World) => Record<string, string>;
  query?: (mine: World, theirs: World) => string;
  body?: unknown;
}

// Team A's owner names team B's ids under team A's slug: every one is simply not found.
const CASES: Record<string, IdCase> = {
  "GET scenario": {
    handler: scenarioRoute.GET,
    method: "GET",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId }),
  },
  "PATCH scenario": {
    handler: scenarioRoute.PATCH,
    method: "PATCH",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId }),
    body: { name: "x" },
  },
  "DELETE scenario": {
    handler: scenarioRoute.DELETE,
    method: "DELETE",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId }),
  },
  "GET revisions": {
    handler: revisionsRoute.GET,
    method: "GET",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId }),
  },
  "POST revisions": {
    handler: revisionsRoute.POST,
    method: "POST",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId }),
    body: { baseRevision: 1, file: demoFileWith(12000) },
  },
  "GET revision": {
    handler: revisionRoute.GET,
    method: "GET",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId, number: "1" }),
  },
  "GET diff": {
    handler: diffRoute.GET,
    method: "GET",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId }),
    query: () => "?from=1&to=1",
  },
  "GET comments": {
    handler: commentsRoute.GET,
    method: "GET",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId, number: "1" }),
  },
  "POST comments": {
    handler: commentsRoute.POST,
    method: "POST",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId, number: "1" }),
    body: { body: "hi" },
  },
  "POST reply to a foreign comment": {
    handler: commentsRoute.POST,
    method: "POST",
    params: (a) => ({ team: a.slug, scenario: a.scenarioId, number: "1" }),
    body: undefined,
  },
  "PATCH foreign comment": {
    handler: commentRoute.PATCH,
    method: "PATCH",
    params: (a, b) => ({ team: a.slug, scenario: a.scenarioId, number: "1", comment: b.commentId }),
    body: { body: "x" },
  },
  "GET review": {
    handler: reviewRoute.GET,
    method: "GET",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId, number: "1" }),
  },
  "POST review": {
    handler: reviewRoute.POST,
    method: "POST",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId, number: "1" }),
    body: { action: "request" },
  },
  "POST share link": {
    handler: createLinkRoute.POST,
    method: "POST",
    params: (a, b) => ({ team: a.slug, scenario: b.scenarioId, number: "1" }),
    body: {},
  },
  "GET share links of a foreign scenario": {
    handler: linksRoute.GET,
    method: "GET",
    params: (a) => ({ team: a.slug }),
    query: (_a, b) => `?scenario=${b.scenarioId}`,
  },
  "DELETE share link": {
    handler: linkRoute.DELETE,
    method: "DELETE",
    params: (a, b) => ({ team: a.slug, link: b.linkId }),
  },
  "GET parameter set": {
    handler: setRoute.GET,
    method: "GET",
    params: (a, b) => ({ team: a.slug, set: b.setId }),
  },
  "PATCH parameter set": {
    handler: setRoute.PATCH,
    method: "PATCH",
    params: (a, b) => ({ team: a.slug, set: b.setId }),
    body: { name: "x" },
  },
  "DELETE parameter set": {
    handler: setRoute.DELETE,
    method: "DELETE",
    params: (a, b) => ({ team: a.slug, set: b.setId }),
  },
};

describe("another team's ids answer 404 and change nothing", () => {
  for (const [name, c] of Object.entries(CASES)) {
    it(name, async () => {
      const [a, b] = [await makeWorld(db), await makeWorld(db)];
      const before = await callRoute(revisionsRoute.GET, {
        params: { team: b.slug, scenario: b.scenarioId },
        cookie: await cookieFor(db, b.members.owner),
      });
      const body =
        name === "POST reply to a foreign comment" ? { body: "x", parentId: b.commentId } : c.body;
      const result = await callRoute(c.handler, {
        method: c.method,
        url: `http://app.test/x${c.query?.(a, b) ?? ""}`,
        params: c.params(a, b),
        cookie: await cookieFor(db, a.members.owner),
        body,
      });
      expect(result.status, JSON.stringify(result.body)).toBe(404);
      expect(result.body.error.code).toMatch(/^not-found:/);
      const after = await callRoute(revisionsRoute.GET, {
        params: { team: b.slug, scenario: b.scenarioId },
        cookie: await cookieFor(db, b.members.owner),
      });
      expect(after).toEqual(before);
    });
  }

  it("forged ids (not UUIDs, not revision numbers) are 404 too, never 500", async () => {
    const a = await makeWorld(db);
    const cookie = await cookieFor(db, a.members.owner);
    for (const scenario of [
      "1",
      "' or 1=1 --",
      "00000000-0000-0000-0000-000000000000",
      a.scenarioId.toUpperCase() + "x",
    ]) {
      const r = await callRoute(scenarioRoute.GET, { params: { team: a.slug, scenario }, cookie });
      expect(r.status).toBe(404);
      expect(r.body.error.code).toBe("not-found:scenario");
    }
    for (const number of ["0", "-1", "1.5", "abc", "99999999999", "2"]) {
      const r = await callRoute(revisionRoute.GET, {
        params: { team: a.slug, scenario: a.scenarioId, number },
        cookie,
      });
      expect(r.status, number).toBe(404);
      expect(r.body.error.code).toBe("not-found:revision");
    }
  });
});

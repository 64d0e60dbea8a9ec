import { eq, and } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";

import * as revisionRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/route";
import * as revisionsRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/route";
import * as scenariosRoute from "@/app/api/v1/teams/[team]/scenarios/route";
import * as checksRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/conformance/route";
import { apiTokens } from "@/db/schema/api-tokens";
import { rateLimitBuckets } from "@/db/schema/rate-limits";
import { memberships } from "@/db/schema/teams";
import { API_RATE_LIMIT } from "@/lib/server/http/route";
import { listApiTokens, revokeApiToken } from "@/lib/server/accounts/api-tokens/manage";
import { createScenario } from "@/lib/server/workspace/scenarios";

import { openTestDb, unique } from "../support/db";
import {
  closeAppPoolAfterAll,
  callRoute,
  DEMO_FILE,
  makeWorld,
  type World,
} from "../support/workspace";
import { bearer, tokenFor } from "./support";

const db = openTestDb();
closeAppPoolAfterAll();

let w: World;
let other: World;
let foreignScenario: string;

beforeAll(async () => {
  w = await makeWorld(db);
  other = await makeWorld(db);
  foreignScenario = other.scenarioId;
  await createScenario(db, w.members.editor, w.slug, { name: unique("Second"), file: DEMO_FILE });
});

const get = (handler: unknown, token: string, params: Record<string, string>) =>
  callRoute(handler, { params, headers: bearer(token) });

describe("personal API tokens", () => {
  it("list scenarios and revisions and fetch a revision's file of the token's team", async () => {
    const { token } = await tokenFor(db, w.members.viewer, w.slug, "viewer");
    const list = await get(scenariosRoute.GET, token, { team: w.slug });
    expect(list.status).toBe(200);
    expect(list.body.items ?? list.body.scenarios).toBeDefined();
    const revs = await get(revisionsRoute.GET, token, { team: w.slug, scenario: w.scenarioId });
    expect(revs.status).toBe(200);
    const rev = await get(revisionRoute.GET, token, {
      team: w.slug,
      scenario: w.scenarioId,
      number: "1",
    });
    expect(rev.status).toBe(200);
    expect(JSON.stringify(rev.body)).toContain("craquelure.scenario/1");
  });

  it("answers 404 for another team's revision, by its id or by the other team's slug", async () => {
    const { token } = await tokenFor(db, w.members.owner, w.slug, "owner");
    const byId = await get(revisionRoute.GET, token, {
      team: w.slug,
      scenario: foreignScenario,
      number: "1",
    });
    expect(byId.status).toBe(404);
    // The owner of `w` is not in `other`; a token never reaches beyond its own team either.
    const bySlug = await get(revisionRoute.GET, token, {
      team: other.slug,
      scenario: foreignScenario,
      number: "1",
    });
    expect(bySlug.status).toBe(404);
    expect(bySlug.body.error.code).toBe("not-found:team");
  });

  it("a team member's token for their own team still cannot reach a team they also belong to", async () => {
    await db
      .insert(memberships)
      .values({ teamId: other.teamId, userId: w.members.editor.id, role: "viewer" });
    const { token } = await tokenFor(db, w.members.editor, w.slug, "editor");
    const res = await get(scenariosRoute.GET, token, { team: other.slug });
    expect(res.status).toBe(404);
  });

  it("answers 401 once revoked, and keeps only the hash", async () => {
    const created = await tokenFor(db, w.members.reviewer, w.slug, "reviewer");
    expect((await get(scenariosRoute.GET, created.token, { team: w.slug })).status).toBe(200);
    const [row] = await db.select().from(apiTokens).where(eq(apiTokens.id, created.id));
    expect(JSON.stringify(row)).not.toContain(created.token);
    await revokeApiToken(db, w.members.reviewer, created.id);
    const res = await get(scenariosRoute.GET, created.token, { team: w.slug });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe("unauthenticated");
    const listed = await listApiTokens(db, w.members.reviewer);
    expect(listed.find((t) => t.id === created.id)?.revokedAt).not.toBeNull();
  });

  it("cannot be revoked by someone else", async () => {
    const created = await tokenFor(db, w.members.viewer, w.slug, "viewer");
    await expect(revokeApiToken(db, w.members.owner, created.id)).rejects.toMatchObject({
      code: "not-found:token",
    });
  });

  it("cannot carry a role above its owner's, and stops working when the owner leaves", async () => {
    await expect(tokenFor(db, w.members.viewer, w.slug, "editor")).rejects.toMatchObject({
      code: "forbidden:token-role",
    });
    await expect(tokenFor(db, w.outsider, w.slug, "viewer")).rejects.toMatchObject({
      code: "not-found:team",
    });
    const { token } = await tokenFor(db, w.members.reviewer, w.slug, "viewer");
    await db
      .delete(memberships)
      .where(and(eq(memberships.teamId, w.teamId), eq(memberships.userId, w.members.reviewer.id)));
    expect((await get(scenariosRoute.GET, token, { team: w.slug })).status).toBe(401);
  });

  it("acts only where both the token's role and the owner's current role allow", async () => {
    const t2 = await makeWorld(db);
    const { token } = await tokenFor(db, t2.members.editor, t2.slug, "editor");
    const body = { fileName: "fe.csv", text: "eps11,eps22,gam12,sig11,sig22,sig12\n0,0,0,0,0,0\n" };
    const params = { team: t2.slug, scenario: t2.scenarioId, number: "1" };
    const post = () =>
      callRoute(checksRoute.POST, { method: "POST", params, headers: bearer(token), body });
    expect((await post()).status).toBe(201);
    await db
      .update(memberships)
      .set({ role: "reviewer" })
      .where(and(eq(memberships.teamId, t2.teamId), eq(memberships.userId, t2.members.editor.id)));
    const demoted = await post();
    expect(demoted.status).toBe(403);
    expect(demoted.body.error.code).toBe("forbidden:token");
    await expect(tokenFor(db, t2.members.owner, t2.slug, "owner")).resolves.toBeDefined();
    await expect(tokenFor(db, t2.members.editor, t2.slug, "editor")).rejects.toMatchObject({
      code: "forbidden:token-role",
    });
  });

  it("answers 429 with Retry-After once a token passes its per-minute limit", async () => {
    const { id, token } = await tokenFor(db, w.members.viewer, w.slug, "viewer");
    expect(
      (await get(revisionsRoute.GET, token, { team: w.slug, scenario: w.scenarioId })).status,
    ).toBe(200);
    // Fill this minute's bucket and the next one, so the answer does not hang on the clock.
    const window = API_RATE_LIMIT.windowMs;
    const start = Math.floor(Date.now() / window) * window;
    for (const at of [start, start + window]) {
      await db
        .insert(rateLimitBuckets)
        .values({ key: `api-token:${id}`, windowStart: new Date(at), count: API_RATE_LIMIT.limit })
        .onConflictDoUpdate({
          target: [rateLimitBuckets.key, rateLimitBuckets.windowStart],
          set: { count: API_RATE_LIMIT.limit },
        });
    }
    const last = await get(revisionsRoute.GET, token, { team: w.slug, scenario: w.scenarioId });
    expect(last.status).toBe(429);
    expect(Number(last.headers.get("retry-after"))).toBeGreaterThan(0);
    // Another token of the same person is counted on its own.
    const fresh = await tokenFor(db, w.members.viewer, w.slug, "viewer");
    expect(
      (await get(revisionsRoute.GET, fresh.token, { team: w.slug, scenario: w.scenarioId })).status,
    ).toBe(200);
  });

  it("answers 401 for an unknown token of the right shape", async () => {
    const res = await get(scenariosRoute.GET, `crq_${"A".repeat(43)}`, { team: w.slug });
    expect(res.status).toBe(401);
  });
});

import { and, count, eq } from "drizzle-orm";

import * as auditRoute from "@/app/api/v1/teams/[team]/audit/route";
import * as exportRoute from "@/app/api/v1/teams/[team]/export/route";
import * as importRoute from "@/app/api/v1/teams/[team]/import/route";
import * as setRoute from "@/app/api/v1/teams/[team]/parameter-sets/[set]/route";
import * as setsRoute from "@/app/api/v1/teams/[team]/parameter-sets/route";
import * as diffRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/diff/route";
import * as commentRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/comments/[comment]/route";
import * as commentsRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/comments/route";
import * as reviewRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/review/route";
import * as revisionRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/route";
import * as createLinkRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/share-links/route";
import * as revisionsRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/route";
import * as scenarioRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/route";
import * as scenariosRoute from "@/app/api/v1/teams/[team]/scenarios/route";
import * as linkRoute from "@/app/api/v1/teams/[team]/share-links/[link]/route";
import * as linksRoute from "@/app/api/v1/teams/[team]/share-links/route";
import * as shareRoute from "@/app/api/v1/share/[token]/route";
import type { Db } from "@/db/client";
import { revisionComments } from "@/db/schema/comments";
import { parameterSets } from "@/db/schema/parameter-sets";
import { scenarioRevisions, scenarios } from "@/db/schema/scenarios";
import { shareLinks } from "@/db/schema/share-links";
import { changeReview } from "@/lib/server/workspace/review";
import { exportTeam } from "@/lib/server/workspace/export";

import { recordingMailer } from "../support/db";
import { demoFileWith, SET_VALUES, type World } from "../support/workspace";

export type ActorKind = "owner" | "editor" | "reviewer" | "viewer" | "outsider" | "anonymous";

export interface RouteCase {
  handler: unknown;
  method: string;
  /** Who may: written from product.md's role table, not derived from permissions.ts. */
  allowed: ActorKind[];
  okStatus?: number;
  /** Status for members who are refused (403 unless the case says otherwise). */
  params: (w: World) => Record<string, string>;
  query?: (w: World) => string;
  body?: (w: World) => unknown;
  /** Runs before the call (e.g. put the revision in review); may return a different team. */
  prepare?: (db: Db, w: World) => Promise<{ team?: string; body?: unknown } | void>;
  happened?: (db: Db, w: World) => Promise<boolean>;
}

const ALL: ActorKind[] = ["owner", "editor", "reviewer", "viewer"];
const EDITORS: ActorKind[] = ["owner", "editor"];
const s = (w: World) => ({ team: w.slug, scenario: w.scenarioId });
const r = (w: World) => ({ ...s(w), number: "1" });

async function scenarioCount(db: Db, teamId: string) {
  const [row] = await db.select({ n: count() }).from(scenarios).where(eq(scenarios.teamId, teamId));
  return row.n;
}
async function scenarioRow(db: Db, w: World) {
  return (await db.select().from(scenarios).where(eq(scenarios.id, w.scenarioId)))[0];
}
async function setRow(db: Db, w: World) {
  return (await db.select().from(parameterSets).where(eq(parameterSets.id, w.setId)))[0];
}
async function revisionOne(db: Db, w: World) {
  const rows = await db
    .select()
    .from(scenarioRevisions)
    .where(and(eq(scenarioRevisions.scenarioId, w.scenarioId), eq(scenarioRevisions.number, 1)));
  return rows[0];
}

export const ROUTE_CASES: Record<string, RouteCase> = {
  "GET scenarios": {
    handler: scenariosRoute.GET,
    method: "GET",
    allowed: ALL,
    params: (w) => ({ team: w.slug }),
  },
  "POST scenarios": {
    handler: scenariosRoute.POST,
    method: "POST",
    allowed: EDITORS,
    okStatus: 201,
    params: (w) => ({ team: w.slug }),
    body: () => ({ name: "New scenario", file: demoFileWith(12000) }),
    happened: async (db, w) => (await scenarioCount(db, w.teamId)) === 2,
  },
  "GET scenario": { handler: scenarioRoute.GET, method: "GET", allowed: ALL, params: s },
  "PATCH scenario": {
    handler: scenarioRoute.PATCH,
    method: "PATCH",
    allowed: EDITORS,
    params: s,
    body: () => ({ name: "Renamed", tags: ["a", "b"] }),
    happened: async (db, w) => (await scenarioRow(db, w)).name === "Renamed",
  },
  "DELETE scenario": {
    handler: scenarioRoute.DELETE,
    method: "DELETE",
    allowed: EDITORS,
    params: s,
    happened: async (db, w) => (await scenarioCount(db, w.teamId)) === 0,
  },
  "GET revisions": { handler: revisionsRoute.GET, method: "GET", allowed: ALL, params: s },
  "POST revisions": {
    handler: revisionsRoute.POST,
    method: "POST",
    allowed: EDITORS,
    okStatus: 201,
    params: s,
    body: () => ({ baseRevision: 1, message: "stiffer", file: demoFileWith(13000) }),
    happened: async (db, w) => (await scenarioRow(db, w)).latestRevision === 2,
  },
  "GET revision": { handler: revisionRoute.GET, method: "GET", allowed: ALL, params: r },
  "GET diff": {
    handler: diffRoute.GET,
    method: "GET",
    allowed: ALL,
    params: s,
    query: () => "?from=1&to=1",
  },
  "GET comments": { handler: commentsRoute.GET, method: "GET", allowed: ALL, params: r },
  "POST comments": {
    handler: commentsRoute.POST,
    method: "POST",
    allowed: ["owner", "editor", "reviewer"],
    okStatus: 201,
    params: r,
    body: (w) => ({ body: `A reply in ${w.slug}`, parentId: w.commentId, increment: 120 }),
    happened: async (db, w) =>
      (
        await db
          .select()
          .from(revisionComments)
          .where(eq(revisionComments.body, `A reply in ${w.slug}`))
      ).length > 0,
  },
  // The world's comment was written by the reviewer: only its author may edit it.
  "PATCH comment": {
    handler: commentRoute.PATCH,
    method: "PATCH",
    allowed: ["reviewer"],
    params: (w) => ({ ...r(w), comment: w.commentId }),
    body: () => ({ body: "Edited words" }),
    happened: async (db, w) =>
      (await db.select().from(revisionComments).where(eq(revisionComments.id, w.commentId)))[0]
        .body === "Edited words",
  },
  "GET review": { handler: reviewRoute.GET, method: "GET", allowed: ALL, params: r },
  "POST review request": {
    handler: reviewRoute.POST,
    method: "POST",
    allowed: EDITORS,
    params: r,
    body: (w) => ({ action: "request", reviewers: [w.members.reviewer.id] }),
    happened: async (db, w) => (await revisionOne(db, w)).reviewState === "in_review",
  },
  "POST review approve": {
    handler: reviewRoute.POST,
    method: "POST",
    allowed: ["owner", "reviewer"],
    params: r,
    body: () => ({ action: "approve", note: "fine" }),
    prepare: async (db, w) => {
      await changeReview(
        db,
        w.members.editor,
        w.slug,
        w.scenarioId,
        1,
        { action: "request", reviewers: [w.members.reviewer.id] },
        recordingMailer(),
      );
    },
    happened: async (db, w) => (await revisionOne(db, w)).reviewState === "approved",
  },
  "POST share link": {
    handler: createLinkRoute.POST,
    method: "POST",
    allowed: EDITORS,
    okStatus: 201,
    params: r,
    body: () => ({ expiresInDays: 3 }),
    happened: async (db, w) =>
      (await db.select().from(shareLinks).where(eq(shareLinks.teamId, w.teamId))).length === 2,
  },
  "GET share links": {
    handler: linksRoute.GET,
    method: "GET",
    allowed: ALL,
    params: (w) => ({ team: w.slug }),
  },
  "DELETE share link": {
    handler: linkRoute.DELETE,
    method: "DELETE",
    allowed: EDITORS,
    params: (w) => ({ team: w.slug, link: w.linkId }),
    happened: async (db, w) =>
      (await db.select().from(shareLinks).where(eq(shareLinks.id, w.linkId)))[0].revokedAt !== null,
  },
  "GET parameter sets": {
    handler: setsRoute.GET,
    method: "GET",
    allowed: ALL,
    params: (w) => ({ team: w.slug }),
  },
  "POST parameter sets": {
    handler: setsRoute.POST,
    method: "POST",
    allowed: EDITORS,
    okStatus: 201,
    params: (w) => ({ team: w.slug }),
    body: () => ({
      name: "Fitted B",
      values: SET_VALUES,
      provenance: { kind: "fitted", records: ["T1"] },
    }),
    happened: async (db, w) =>
      (await db.select().from(parameterSets).where(eq(parameterSets.teamId, w.teamId))).length ===
      2,
  },
  "GET parameter set": {
    handler: setRoute.GET,
    method: "GET",
    allowed: ALL,
    params: (w) => ({ team: w.slug, set: w.setId }),
  },
  "PATCH parameter set": {
    handler: setRoute.PATCH,
    method: "PATCH",
    allowed: EDITORS,
    params: (w) => ({ team: w.slug, set: w.setId }),
    body: () => ({ name: "Renamed set" }),
    happened: async (db, w) => (await setRow(db, w)).name === "Renamed set",
  },
  "PATCH parameter set values": {
    handler: setRoute.PATCH,
    method: "PATCH",
    allowed: EDITORS,
    params: (w) => ({ team: w.slug, set: w.setId }),
    body: () => ({ values: { ...SET_VALUES, E1: 9100, E2: 9100, G12: 3500 } }),
    // New numbers are version 2 of the set; a refused edit leaves it at version 1.
    happened: async (db, w) => (await setRow(db, w)).version === 2,
  },
  "DELETE parameter set": {
    handler: setRoute.DELETE,
    method: "DELETE",
    allowed: EDITORS,
    params: (w) => ({ team: w.slug, set: w.setId }),
    happened: async (db, w) => (await setRow(db, w)) === undefined,
  },
  "GET export": {
    handler: exportRoute.GET,
    method: "GET",
    allowed: ALL,
    params: (w) => ({ team: w.slug }),
  },
  "GET audit": {
    handler: auditRoute.GET,
    method: "GET",
    allowed: ALL,
    params: (w) => ({ team: w.slug }),
  },
  // Import needs an empty team: the world is exported, then emptied, then imported again.
  "POST import": {
    handler: importRoute.POST,
    method: "POST",
    allowed: ["owner"],
    okStatus: 201,
    params: (w) => ({ team: w.slug }),
    prepare: async (db, w) => {
      const doc = await exportTeam(db, w.members.owner, w.slug);
      await db.delete(scenarios).where(eq(scenarios.teamId, w.teamId));
      await db.delete(parameterSets).where(eq(parameterSets.teamId, w.teamId));
      return { body: doc };
    },
    happened: async (db, w) => (await scenarioCount(db, w.teamId)) === 1,
  },
  "GET share (public)": {
    handler: shareRoute.GET,
    method: "GET",
    allowed: ["owner", "editor", "reviewer", "viewer", "outsider", "anonymous"],
    params: (w) => ({ token: w.token }),
  },
};

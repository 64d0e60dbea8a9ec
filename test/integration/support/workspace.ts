import { readFileSync } from "node:fs";
import path from "node:path";

import { afterAll } from "vitest";

import type { Db } from "@/db/client";
import type { SignedInActor } from "@/lib/server/accounts/actor";
import { createLucia, SESSION_COOKIE } from "@/lib/server/accounts/auth/lucia";
import { createSessionToken } from "@/lib/server/accounts/auth/session-token";
import { addComment } from "@/lib/server/workspace/comments";
import { createParameterSet } from "@/lib/server/workspace/parameter-sets";
import { createScenario } from "@/lib/server/workspace/scenarios";
import { createShareLink } from "@/lib/server/workspace/share-links";

import { unique } from "./db";
import { fromPeer } from "./peer";
import { makeTeamWithAllRoles, type TeamFixture } from "./team";

export const DEMO_FILE = JSON.parse(
  readFileSync(path.join(process.cwd(), "test/fixtures/demo-scenario.json"), "utf8"),
) as { parameterSets: Record<string, unknown>[]; path: { legs: Record<string, unknown>[] } };

/** The demo file with the first set's E1 changed: a distinct, still valid revision. */
export function demoFileWith(e1: number, extra: Record<string, unknown> = {}) {
  const file = structuredClone(DEMO_FILE);
  file.parameterSets[0].E1 = e1;
  file.parameterSets[0].E2 = e1;
  file.parameterSets[0].G12 = e1 / 2.6;
  return { ...file, ...extra };
}

export const SET_VALUES = (() => {
  const { id: _id, ...values } = DEMO_FILE.parameterSets[0];
  return values;
})();

export interface World extends TeamFixture {
  scenarioId: string;
  setId: string;
  commentId: string;
  linkId: string;
  token: string;
}

/** A team with one member per role, a scenario (revision 1), a set, a comment and a share link. */
export async function makeWorld(db: Db): Promise<World> {
  const t = await makeTeamWithAllRoles(db);
  const editor = t.members.editor;
  const created = await createScenario(db, editor, t.slug, {
    name: unique("Scenario"),
    materialLabel: "SMC",
    tags: ["plate"],
    file: DEMO_FILE,
  });
  const set = await createParameterSet(db, editor, t.slug, {
    name: unique("Set"),
    values: SET_VALUES,
  });
  const comment = await addComment(db, t.members.reviewer, t.slug, created.scenario.id, 1, {
    body: "First look",
  });
  const link = await createShareLink(db, editor, t.slug, created.scenario.id, 1, {});
  return {
    ...t,
    scenarioId: created.scenario.id,
    setId: set.id,
    commentId: comment.id,
    linkId: link.link.id,
    token: link.token,
  };
}

/** A session cookie header for the actor, made through lucia like a real sign-in. */
export async function cookieFor(db: Db, actor: SignedInActor | null): Promise<string | undefined> {
  if (!actor) return undefined;
  const lucia = createLucia(db, { secureCookies: false });
  const { token } = await createSessionToken(lucia, actor.id);
  return `${SESSION_COOKIE}=${token}`;
}

type Handler = (request: Request, context: { params: Promise<never> }) => Promise<Response>;

export interface CallResult {
  status: number;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  body: any;
  headers: Headers;
}

/**
 * Calls an exported route handler the way Next does behind scripts/serve.ts: a Request with the
 * peer header and a params promise.
 */
export async function callRoute(
  handler: unknown,
  opts: {
    method?: string;
    url?: string;
    params: Record<string, string>;
    cookie?: string;
    body?: unknown;
    rawBody?: string;
    headers?: Record<string, string>;
  },
): Promise<CallResult> {
  // A client of its own unless the test names one (opts.headers can set the peer header).
  const headers: Record<string, string> = { ...fromPeer(), ...opts.headers };
  if (opts.cookie) headers.cookie = opts.cookie;
  let body: string | undefined = opts.rawBody;
  if (opts.body !== undefined) {
    body = JSON.stringify(opts.body);
    headers["content-type"] = "application/json";
  }
  const request = new Request(opts.url ?? "http://app.test/api/v1/x", {
    method: opts.method ?? "GET",
    headers,
    body,
  });
  const response = await (handler as Handler)(request, {
    params: Promise.resolve(opts.params) as Promise<never>,
  });
  const text = await response.text();
  return {
    status: response.status,
    body: text ? JSON.parse(text) : null,
    headers: response.headers,
  };
}

/** The route handlers share the app's pool (db/index.ts); close it after the file. */
export function closeAppPoolAfterAll(): void {
  afterAll(async () => {
    const holder = globalThis as unknown as { __craqDb?: { close: () => Promise<void> } };
    await holder.__craqDb?.close();
    holder.__craqDb = undefined;
  });
}

/// <reference types="vite/client" />
import fc from "fast-check";
import { describe, expect, it } from "vitest";

import { openTestDb } from "../support/db";
import { fromPeer } from "../support/peer";
import { closeAppPoolAfterAll, cookieFor, makeWorld } from "../support/workspace";

import { bodyArb, paramsArb, queryArb } from "./arbitraries";

// Every route handler under app/api, found on disk so a new route is fuzzed without being listed,
// called the way Next calls it with a signed-in owner's cookie. Whatever arrives, the answer is
// 2xx–4xx and its body never shows a stack trace or a driver's message.
const db = openTestDb();
closeAppPoolAfterAll();

const RUNS = Number(process.env.FUZZ_RUNS ?? 20);
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
const modules = import.meta.glob<Record<string, unknown>>("/app/api/**/route.ts", { eager: true });

type Handler = (request: Request, context: { params: Promise<unknown> }) => Promise<Response>;

const LEAKS =
  /\n\s+at |\.(ts|js|mjs):\d+|node_modules|postgres(ql)? error|syntax error at|violates/i;

function paramNames(file: string): string[] {
  return [...file.matchAll(/\[(\w+)\]/g)].map((m) => m[1]);
}

const handlers = Object.entries(modules).flatMap(([file, mod]) =>
  METHODS.filter((m) => typeof mod[m] === "function").map((method) => ({
    file,
    method,
    handler: mod[method] as Handler,
  })),
);

describe("fuzzing every route's path, query and body", () => {
  it("finds the routes on disk", () => {
    expect(handlers.length).toBeGreaterThan(30);
  });

  it.each(handlers.map((h) => [`${h.method} ${h.file.replace("/app/api/v1", "")}`, h] as const))(
    "%s answers 2xx/4xx without a stack trace",
    async (_name, { file, method, handler }) => {
      const w = await makeWorld(db);
      const cookie = (await cookieFor(db, w.members.owner))!;
      const url = `http://app.test${file.replace(/^\/app/, "").replace(/\/route\.ts$/, "")}`;
      await fc.assert(
        fc.asyncProperty(
          paramsArb(w, paramNames(file)),
          queryArb,
          bodyArb,
          async (params, query, body) => {
            const withBody = method !== "GET" && body !== undefined;
            const request = new Request(`${url}?${query}`, {
              method,
              headers: {
                cookie,
                "content-type": "application/json",
                ...fromPeer("198.51.100.7"),
              },
              body: withBody ? body : undefined,
            });
            const response = await handler(request, { params: Promise.resolve(params) });
            const text = await response.text();
            expect(response.status, text.slice(0, 300)).toBeGreaterThanOrEqual(200);
            expect(response.status, text.slice(0, 300)).toBeLessThan(500);
            if (response.status >= 400) expect(text).not.toMatch(LEAKS);
          },
        ),
        { numRuns: RUNS, seed: process.env.FUZZ_SEED ? Number(process.env.FUZZ_SEED) : undefined },
      );
    },
  );
});

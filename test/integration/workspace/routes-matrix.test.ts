import { describe, expect, it } from "vitest";

import type { Actor } from "@/lib/server/accounts/actor";

import { openTestDb } from "../support/db";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  makeWorld,
  type World,
} from "../support/workspace";
import { ROUTE_CASES, type ActorKind } from "./route-cases";

const db = openTestDb();
closeAppPoolAfterAll();

const KINDS: ActorKind[] = ["owner", "editor", "reviewer", "viewer", "outsider", "anonymous"];

function actorFor(kind: ActorKind, w: World): Actor {
  if (kind === "anonymous") return null;
  if (kind === "outsider") return w.outsider;
  return w.members[kind];
}

// Members without the capability learn they may not (403); people outside the team learn
// nothing (404, the same as an unknown team); nobody signed in is asked to sign in (401).
function refusal(kind: ActorKind): number {
  if (kind === "anonymous") return 401;
  if (kind === "outsider") return 404;
  return 403;
}

describe("every workspace route against every kind of caller, through the HTTP handlers", () => {
  for (const [name, c] of Object.entries(ROUTE_CASES)) {
    for (const kind of KINDS) {
      const allowed = c.allowed.includes(kind);
      const expected = allowed ? (c.okStatus ?? 200) : refusal(kind);
      it(`${name} by ${kind} → ${expected}`, async () => {
        const w = await makeWorld(db);
        const prepared = (await c.prepare?.(db, w)) ?? {};
        if (c.happened) expect(await c.happened(db, w)).toBe(false);
        const result = await callRoute(c.handler, {
          method: c.method,
          url: `http://app.test/api/v1/x${c.query?.(w) ?? ""}`,
          params: prepared.team ? { ...c.params(w), team: prepared.team } : c.params(w),
          cookie: await cookieFor(db, actorFor(kind, w)),
          body: prepared.body ?? c.body?.(w),
        });
        expect(result.status, JSON.stringify(result.body)).toBe(expected);
        expect(result.headers.get("content-type")).toContain("application/json");
        if (!allowed) {
          expect(Object.keys(result.body)).toEqual(["error"]);
          expect(typeof result.body.error.code).toBe("string");
          expect(result.body.error.message).toMatch(/\w/);
          expect(JSON.stringify(result.body)).not.toMatch(/at .*\.ts|stack/i);
        }
        if (c.happened) expect(await c.happened(db, w)).toBe(allowed);
      });
    }
  }
});

import { randomBytes } from "node:crypto";

import { describe, expect, it } from "vitest";

import * as shareRoute from "@/app/api/v1/share/[token]/route";
import * as recordsRoute from "@/app/api/v1/teams/[team]/test-records/route";
import { SHARE_MISS_RULE } from "@/lib/server/workspace/share-view";

import { openTestDb, unique } from "../support/db";
import { fromPeer } from "../support/peer";
import { callRoute, closeAppPoolAfterAll, cookieFor, makeWorld } from "../support/workspace";
import { uploadBody } from "../records/support";

// Abuse beyond single odd values: bodies past every limit, CSV built to exhaust a parser, and a
// guesser walking the share-token space.
const db = openTestDb();
closeAppPoolAfterAll();

type Handler = (request: Request, context: { params: Promise<unknown> }) => Promise<Response>;
const modules = import.meta.glob<Record<string, unknown>>("/app/api/**/route.ts", { eager: true });
const writers = Object.entries(modules).flatMap(([file, mod]) =>
  (["POST", "PATCH", "PUT"] as const)
    .filter((m) => typeof mod[m] === "function")
    .map((method) => ({ file, method, handler: mod[method] as Handler })),
);

/** A body stream that never ends on its own: the reader must stop it. */
function endlessBody(): ReadableStream<Uint8Array> {
  const chunk = new TextEncoder().encode(`"${"x".repeat(1024 * 1024 - 2)}"`);
  let sent = 0;
  return new ReadableStream({
    pull(controller) {
      // A hard stop far past every limit, so a missing check fails instead of hanging.
      if (sent++ > 200) controller.close();
      else controller.enqueue(chunk);
    },
  });
}

describe("bodies past the limits", () => {
  it.each(writers.map((w) => [`${w.method} ${w.file.replace("/app/api/v1", "")}`, w] as const))(
    "%s answers 413 to a body that claims or streams too much",
    async (_name, { file, method, handler }) => {
      const w = await makeWorld(db);
      const cookie = (await cookieFor(db, w.members.owner))!;
      const params = {
        team: w.slug,
        scenario: w.scenarioId,
        number: "1",
        comment: w.commentId,
        set: w.setId,
        link: w.linkId,
        record: "x",
        fit: "x",
        study: "x",
        check: "x",
      };
      const url = `http://app.test${file.replace(/^\/app/, "").replace(/\/route\.ts$/, "")}`;
      const claimed = await handler(
        new Request(url, {
          method,
          headers: {
            cookie,
            "content-type": "application/json",
            "content-length": String(1024 ** 3),
          },
          body: "{}",
        }),
        { params: Promise.resolve(params) },
      );
      expect(claimed.status).toBe(413);
      const streamed = await handler(
        new Request(url, {
          method,
          headers: { cookie, "content-type": "application/json" },
          body: endlessBody(),
          duplex: "half",
        } as RequestInit),
        { params: Promise.resolve(params) },
      );
      expect(streamed.status).toBe(413);
      expect((await streamed.json()).error.code).toBe("invalid:too-large");
    },
  );
});

describe("CSV built to exhaust the parser", () => {
  it("refuses a million columns and an endless quoted cell with a line-and-cell error", async () => {
    const w = await makeWorld(db);
    const cookie = await cookieFor(db, w.members.editor);
    const upload = (text: string) =>
      callRoute(recordsRoute.POST, {
        method: "POST",
        params: { team: w.slug },
        cookie,
        body: uploadBody(text),
      });
    const wide = await upload(
      `${Array.from({ length: 1_000_000 }, (_, i) => `c${i}`).join(",")}\n1,2\n`,
    );
    expect(wide.status).toBe(422);
    expect(wide.body.error.code).toMatch(/^invalid:/);
    expect(wide.body.error.message).toMatch(/column/i);
    const quoted = await upload(`strain,stress\n"${"1,2\n".repeat(1_500_000)}`);
    expect(quoted.status).toBe(422);
    expect(quoted.body.error.code).toMatch(/^invalid:/);
    const tooBig = await upload("1,2\n".repeat(3_000_000));
    expect([400, 413]).toContain(tooBig.status);
    expect(
      (await callRoute(recordsRoute.GET, { params: { team: w.slug }, cookie })).body.items ?? [],
    ).toHaveLength(0);
  });
});

describe("guessing share tokens", () => {
  it("answers 1,000 guesses from one address with 404 until the limit, then 429, never a revision", async () => {
    const w = await makeWorld(db);
    const address = unique("203.0.113");
    const statuses: number[] = [];
    for (let i = 0; i < 1000; i++) {
      const token = randomBytes(16).toString("base64url");
      const r = await callRoute(shareRoute.GET, {
        params: { token },
        headers: fromPeer(address),
      });
      statuses.push(r.status);
      if (r.status === 429) expect(r.body.error.code).toBe("rate-limited:share");
      else expect(r.body.error.code).toBe("not-found:share");
    }
    expect(statuses.slice(0, SHARE_MISS_RULE.limit).every((s) => s === 404)).toBe(true);
    expect(statuses.slice(SHARE_MISS_RULE.limit).every((s) => s === 429)).toBe(true);
    // The limit is the guesser's, not the link's: the real token still opens from elsewhere.
    const real = await callRoute(shareRoute.GET, {
      params: { token: w.token },
      headers: fromPeer(unique("192.0.2")),
    });
    expect(real.status).toBe(200);
  });
});

import { createHash } from "node:crypto";

import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import * as shareRoute from "@/app/api/v1/share/[token]/route";
import { shareLinks } from "@/db/schema/share-links";
import {
  createShareLink,
  listShareLinks,
  revokeShareLink,
} from "@/lib/server/workspace/share-links";
import { SHARE_GONE_MESSAGE, SHARE_MISS_RULE } from "@/lib/server/workspace/share-view";

import { openTestDb, unique } from "../support/db";
import { fromPeer } from "../support/peer";
import { callRoute, closeAppPoolAfterAll, DEMO_FILE, makeWorld } from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

const DAY = 24 * 60 * 60 * 1000;

function open(token: string, address = unique("10.0.0")) {
  return callRoute(shareRoute.GET, { params: { token }, headers: fromPeer(address) });
}

function expectGone(r: { status: number; body: unknown }) {
  expect(r.status).toBe(404);
  // The plain message and nothing else: no hint whether the link expired, was revoked or never was.
  expect(r.body).toEqual({ error: { code: "not-found:share", message: SHARE_GONE_MESSAGE } });
}

describe("share links", () => {
  it("a live link shows the revision's file and names to anyone, and counts each view", async () => {
    const w = await makeWorld(db);
    const first = await open(w.token);
    expect(first.status).toBe(200);
    expect(first.body.file).toEqual(DEMO_FILE);
    expect(first.body.revision).toMatchObject({
      number: 1,
      authorName: "editor",
      reviewState: "draft",
    });
    expect(first.body.scenario.materialLabel).toBe("SMC");
    // Names for the page, but no e-mail addresses and no internal ids.
    const { file: _file, ...names } = first.body;
    expect(JSON.stringify(names)).not.toMatch(/@|[0-9a-f]{8}-[0-9a-f]{4}-/);
    await open(w.token);
    const [link] = (await listShareLinks(db, w.members.viewer, w.slug)).items;
    expect(link).toMatchObject({ viewCount: 2, state: "active", revision: 1 });
    expect(link.lastViewedAt).not.toBeNull();
  });

  it("stores only the token's SHA-256, defaults to 14 days, and never lists tokens", async () => {
    const w = await makeWorld(db);
    const now = new Date("2026-03-01T00:00:00Z");
    const made = await createShareLink(db, w.members.editor, w.slug, w.scenarioId, 1, {}, now);
    expect(made.token).toMatch(/^[A-Za-z0-9_-]{22}$/);
    expect(made.path).toBe(`/share/${made.token}`);
    const [row] = await db.select().from(shareLinks).where(eq(shareLinks.id, made.link.id));
    expect(row.tokenHash).toBe(createHash("sha256").update(made.token).digest("hex"));
    expect(row.expiresAt.getTime() - now.getTime()).toBe(14 * DAY);
    const listed = JSON.stringify(await listShareLinks(db, w.members.owner, w.slug));
    expect(listed).not.toContain(made.token);
    expect(listed).not.toContain(row.tokenHash);
  });

  it("expired, revoked, unknown and malformed tokens all answer the same 404", async () => {
    const w = await makeWorld(db);
    const old = await createShareLink(
      db,
      w.members.editor,
      w.slug,
      w.scenarioId,
      1,
      { expiresInDays: 1 },
      new Date(Date.now() - 2 * DAY),
    );
    expectGone(await open(old.token));
    expect((await open(w.token)).status).toBe(200);
    await revokeShareLink(db, w.members.editor, w.slug, w.linkId);
    expectGone(await open(w.token));
    expectGone(await open("A".repeat(22)));
    expectGone(await open("short"));
    expectGone(await open("../../etc/passwd"));
    const [link] = (await listShareLinks(db, w.members.owner, w.slug)).items.filter(
      (l) => l.id === w.linkId,
    );
    expect(link).toMatchObject({ state: "revoked", viewCount: 1 });
  });

  it("revoking twice keeps the first revocation", async () => {
    const w = await makeWorld(db);
    const at = new Date("2026-01-01T00:00:00Z");
    await revokeShareLink(db, w.members.editor, w.slug, w.linkId, at);
    await revokeShareLink(db, w.members.owner, w.slug, w.linkId);
    const [row] = await db.select().from(shareLinks).where(eq(shareLinks.id, w.linkId));
    expect(row.revokedAt?.toISOString()).toBe(at.toISOString());
    expect(row.revokedBy).toBe(w.members.editor.id);
  });

  it("an address that keeps missing is slowed down (429); other addresses and live links are not", async () => {
    const w = await makeWorld(db);
    const guesser = unique("192.0.2");
    for (let i = 0; i < SHARE_MISS_RULE.limit; i++)
      expectGone(await open(`${"B".repeat(21)}${i % 10}`, guesser));
    const blocked = await open("C".repeat(22), guesser);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe("rate-limited:share");
    expect((await open(w.token)).status).toBe(200);
  });
});

import { eq, inArray } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";

import { requireDatabaseUrl } from "@/db/client";
import { mailOutbox } from "@/db/schema/mail-outbox";
import { rateLimitBuckets } from "@/db/schema/rate-limits";
import { sessions } from "@/db/schema/sessions";
import { createLucia, SESSION_COOKIE } from "@/lib/server/accounts/auth/lucia";
import {
  createSessionToken,
  SESSION_ABSOLUTE_DAYS,
  sessionIdOf,
  validateSessionToken,
} from "@/lib/server/accounts/auth/session-token";
import { openStudyQueue } from "@/lib/server/handoff/studies/queue";
import { actorFromRequest } from "@/lib/server/http/request-actor";
import { cleanUpExpiredRows } from "@/lib/server/maintenance/cleanup";
import { CLEANUP_QUEUE, registerMaintenanceJobs } from "@/lib/server/maintenance/jobs";

import { makeUser, openTestDb, unique } from "../support/db";
import { closeAppPoolAfterAll } from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();
const lucia = createLucia(db, { secureCookies: false });
const DAY = 24 * 60 * 60 * 1000;

function requestWith(token: string) {
  return new Request("http://app.test/api/v1/teams", {
    headers: { cookie: `${SESSION_COOKIE}=${token}` },
  });
}

describe("item 6: sessions that outlive their reason", () => {
  it("the sessions table holds no cookie value: only its SHA-256", async () => {
    const user = await makeUser(db);
    const { token } = await createSessionToken(lucia, user.id);
    const cookie = lucia.createSessionCookie(token);
    expect(cookie.value).toBe(token);
    const rows = await db.select().from(sessions).where(eq(sessions.userId, user.id));
    expect(rows).toHaveLength(1);
    expect(rows[0].id).not.toBe(token);
    expect(rows[0].id).toBe(sessionIdOf(token));
    // The cookie works; the stored id, replayed as a cookie, does not.
    expect((await actorFromRequest(requestWith(token))).actor?.id).toBe(user.id);
    expect((await actorFromRequest(requestWith(rows[0].id))).actor).toBeNull();
  });

  it("a session past its absolute lifetime is refused even while in use", async () => {
    const user = await makeUser(db);
    const signedIn = new Date(Date.now() - (SESSION_ABSOLUTE_DAYS + 1) * DAY);
    const { token, session } = await createSessionToken(lucia, user.id, signedIn);
    // Kept busy: the sliding expiry is still days ahead.
    await db
      .update(sessions)
      .set({ expiresAt: new Date(Date.now() + 5 * DAY) })
      .where(eq(sessions.id, session.id));
    const answer = await actorFromRequest(requestWith(token));
    expect(answer.actor).toBeNull();
    expect(answer.setCookie).toMatch(new RegExp(`^${SESSION_COOKIE}=;`));
    expect(await db.select().from(sessions).where(eq(sessions.id, session.id))).toHaveLength(0);

    // One day short of the limit it still works.
    const young = await createSessionToken(lucia, user.id, new Date(Date.now() - 29 * DAY));
    expect((await validateSessionToken(lucia, young.token)).user?.id).toBe(user.id);
  });

  it("the cleanup deletes expired sessions, old rate-limit windows and sent mail, keeps live rows", async () => {
    const user = await makeUser(db);
    const now = new Date();
    const live = await createSessionToken(lucia, user.id, now);
    const idle = await createSessionToken(lucia, user.id, now);
    await db
      .update(sessions)
      .set({ expiresAt: new Date(now.getTime() - 1000) })
      .where(eq(sessions.id, idle.session.id));
    const old = await createSessionToken(lucia, user.id, new Date(now.getTime() - 31 * DAY));

    const key = unique("cleanup");
    await db.insert(rateLimitBuckets).values([
      { key, windowStart: new Date(now.getTime() - 2 * DAY), count: 5 },
      { key, windowStart: new Date(now.getTime() - 60_000), count: 1 },
    ]);
    const to = `${unique("cleanup")}@test.craquelure.local`;
    const mail = { to, subject: "s", text: "t", html: "h" };
    await db.insert(mailOutbox).values([
      { ...mail, subject: "sent long ago", sentAt: new Date(now.getTime() - 8 * DAY) },
      { ...mail, subject: "sent today", sentAt: new Date(now.getTime() - 60_000) },
      { ...mail, subject: "never sent", createdAt: new Date(now.getTime() - 30 * DAY) },
    ]);

    const removed = await cleanUpExpiredRows(db, now);
    expect(removed.sessions).toBeGreaterThanOrEqual(2);
    const left = await db
      .select({ id: sessions.id })
      .from(sessions)
      .where(inArray(sessions.id, [live.session.id, idle.session.id, old.session.id]));
    expect(left.map((r) => r.id)).toEqual([live.session.id]);
    const windows = await db.select().from(rateLimitBuckets).where(eq(rateLimitBuckets.key, key));
    expect(windows.map((w) => w.count)).toEqual([1]);
    const kept = await db.select().from(mailOutbox).where(eq(mailOutbox.to, to));
    expect(kept.map((m) => m.subject).sort()).toEqual(["never sent", "sent today"]);
  });

  describe("the scheduled job", () => {
    let boss: Awaited<ReturnType<typeof openStudyQueue>> | undefined;
    afterAll(async () => {
      await boss?.stop({ graceful: false, wait: true });
    });

    it("is scheduled hourly on pg-boss and a run of it deletes what has expired", async () => {
      boss = await openStudyQueue(requireDatabaseUrl());
      await registerMaintenanceJobs(boss, db);
      const schedules = await boss.getSchedules();
      expect(schedules.map((s) => s.name)).toContain(CLEANUP_QUEUE);

      const user = await makeUser(db);
      const idle = await createSessionToken(lucia, user.id);
      await db
        .update(sessions)
        .set({ expiresAt: new Date(Date.now() - 1000) })
        .where(eq(sessions.id, idle.session.id));
      const id = await boss.send(CLEANUP_QUEUE, {});
      const deadline = Date.now() + 20_000;
      let state: string | undefined;
      while (Date.now() < deadline) {
        state = (await boss.getJobById(CLEANUP_QUEUE, id!))?.state;
        if (state === "completed" || state === "failed") break;
        await new Promise((r) => setTimeout(r, 250));
      }
      expect(state).toBe("completed");
      expect(await db.select().from(sessions).where(eq(sessions.id, idle.session.id))).toHaveLength(
        0,
      );
    });
  });
});

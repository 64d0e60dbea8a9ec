import { eq, inArray, isNull } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";

import { mailOutbox } from "@/db/schema/mail-outbox";
import { durableMailer, flushOutbox, retryDelayMs } from "@/lib/server/email/mail-outbox";
import type { Mailer, MailMessage } from "@/lib/shared/mail-types";
import { inviteMember } from "@/lib/server/teams/invitations";
import { changeReview } from "@/lib/server/workspace/review";

import { openTestDb, unique } from "../support/db";
import { makeWorld } from "../support/workspace";

// The mail server down: mail is kept in mail_outbox, the caller hears "queued", and a later pass
// delivers exactly what was queued once the server takes mail again.
const db = openTestDb();

const down: Mailer = {
  async send() {
    throw new Error("connect ECONNREFUSED 127.0.0.1:2525");
  },
};

function recorder() {
  const sent: MailMessage[] = [];
  return { sent, mailer: { send: async (m: MailMessage) => void sent.push(m) } satisfies Mailer };
}

const later = (ms: number) => () => new Date(Date.now() + ms);

// Account mail queued by earlier test files (files run one at a time) would be first in line
// for these passes; set it aside so each pass sees only this file's messages.
beforeEach(async () => {
  await db.update(mailOutbox).set({ sentAt: new Date() }).where(isNull(mailOutbox.sentAt));
});

describe("mail outbox", () => {
  it("keeps a refused message, retries later with a growing wait, and sends it once", async () => {
    const to = `${unique("someone")}@test.craquelure.local`;
    const message = { to, subject: "Hello", text: "plain", html: "<p>plain</p>" };
    expect(await durableMailer(db, down).send(message)).toEqual({ queued: true });
    const [row] = await db.select().from(mailOutbox).where(eq(mailOutbox.to, to));
    expect(row).toMatchObject({ attempts: 1, sentAt: null, subject: "Hello" });
    expect(row.lastError).toContain("ECONNREFUSED");

    // Still down: one more attempt recorded, and the next one pushed further out.
    const stillDown = await flushOutbox(db, down, later(retryDelayMs(1) + 1000));
    expect(stillDown.failed).toBe(1);
    const [retried] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, row.id));
    expect(retried.attempts).toBe(2);
    expect(retried.nextAttemptAt.getTime()).toBeGreaterThan(row.nextAttemptAt.getTime());

    // Back: delivered as queued, marked sent, and not sent again by the next pass.
    const back = recorder();
    await flushOutbox(db, back.mailer, later(10 * 60_000));
    expect(back.sent.filter((m) => m.to === to)).toEqual([message]);
    const [done] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, row.id));
    expect(done.sentAt).not.toBeNull();
    const again = recorder();
    await flushOutbox(db, again.mailer, later(20 * 60_000));
    expect(again.sent.filter((m) => m.to === to)).toEqual([]);
  });

  it("a mail server that answers sends at once and keeps nothing", async () => {
    const to = `${unique("direct")}@test.craquelure.local`;
    const up = recorder();
    const result = await durableMailer(db, up.mailer).send({
      to,
      subject: "s",
      text: "t",
      html: "h",
    });
    expect(result).toEqual({ queued: false });
    expect(up.sent).toHaveLength(1);
    expect(await db.select().from(mailOutbox).where(eq(mailOutbox.to, to))).toEqual([]);
  });

  it("tells the inviter and the reviewer that their mails were queued", async () => {
    const w = await makeWorld(db);
    const deps = { mailer: durableMailer(db, down), appUrl: "http://app.test" };
    const email = `${unique("invitee")}@test.craquelure.local`;
    const invitation = await inviteMember(
      db,
      w.members.owner,
      { teamSlug: w.slug, email, role: "viewer" },
      deps,
    );
    expect(invitation.mailQueued).toBe(true);
    const review = await changeReview(
      db,
      w.members.editor,
      w.slug,
      w.scenarioId,
      1,
      { action: "request", note: "", reviewers: [w.members.reviewer.id, w.members.owner.id] },
      deps,
    );
    expect(review.notified).toBe(0);
    // The two chosen, the reviewer and the owner; the editor who asked is not mailed about their
    // own request.
    expect(review.mailQueued).toBe(2);
    const queued = await db
      .select()
      .from(mailOutbox)
      .where(
        inArray(mailOutbox.to, [
          email,
          w.members.editor.email,
          w.members.reviewer.email,
          w.members.owner.email,
        ]),
      );
    expect(queued.map((r) => r.to).sort()).toEqual(
      [email, w.members.reviewer.email, w.members.owner.email].sort(),
    );
    expect(queued.find((r) => r.to === email)?.text).toContain("/invite/");
  });
});

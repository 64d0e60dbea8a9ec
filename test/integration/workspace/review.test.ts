import { describe, expect, it } from "vitest";

import { changeReview, reviewHistory } from "@/lib/server/workspace/review";
import { saveRevision } from "@/lib/server/workspace/revisions";

import { makeUser, openTestDb, recordingMailer } from "../support/db";
import { outcome } from "../support/outcome";
import { demoFileWith, makeWorld } from "../support/workspace";
import { memberships } from "@/db/schema/teams";

const db = openTestDb();

describe("review: draft → in review → approved | changes requested, with e-mail", () => {
  it("mails the chosen reviewer only on request (never the requester, not the owner left out), and the editors on a verdict", async () => {
    const w = await makeWorld(db);
    // A second editor who never touched this scenario hears nothing.
    const bystander = await makeUser(db, { name: "Bystander" });
    await db.insert(memberships).values({ teamId: w.teamId, userId: bystander.id, role: "editor" });
    // The owner saves revision 2, so the owner is one of the scenario's editors too.
    await saveRevision(db, w.members.owner, w.slug, w.scenarioId, {
      baseRevision: 1,
      file: demoFileWith(12500),
    });

    const mail = recordingMailer();
    const requested = await changeReview(
      db,
      w.members.editor,
      w.slug,
      w.scenarioId,
      2,
      { action: "request", note: "please check b", reviewers: [w.members.reviewer.id] },
      mail,
    );
    expect(requested.revision.review).toMatchObject({
      state: "in_review",
      by: { id: w.members.editor.id },
    });
    // Only the chosen reviewer: not the requester (the editor), not the owner, who edited the
    // scenario and gives verdicts too but was not chosen.
    expect(mail.sent.map((m) => m.to)).toEqual([w.members.reviewer.email]);
    expect(requested.notified).toBe(1);
    expect(requested.history.at(-1)?.askedOf).toEqual([
      { id: w.members.reviewer.id, name: w.members.reviewer.name },
    ]);
    expect(mail.sent[0].subject).toMatch(/^Review requested: ".+", revision 2$/);
    expect(mail.sent[0].text).toContain("please check b");
    expect(mail.sent[0].text).toContain(
      `http://app.test/teams/${w.slug}/scenarios/${w.scenarioId}?rev=2`,
    );

    mail.sent.length = 0;
    const verdict = await changeReview(
      db,
      w.members.reviewer,
      w.slug,
      w.scenarioId,
      2,
      { action: "request-changes", note: "b too high" },
      mail,
    );
    expect(verdict.revision.review.state).toBe("changes_requested");
    expect(mail.sent.map((m) => m.to).sort()).toEqual(
      [w.members.editor.email, w.members.owner.email].sort(),
    );
    expect(mail.sent[0].subject).toMatch(/^Changes requested:/);
    expect(mail.sent.some((m) => m.to === bystander.email || m.to === w.members.viewer.email)).toBe(
      false,
    );

    // Asked again after changes, of the owner this time, then approved: the full history is
    // kept in order, each request with whom it was asked of.
    mail.sent.length = 0;
    await changeReview(
      db,
      w.members.editor,
      w.slug,
      w.scenarioId,
      2,
      { action: "request", reviewers: [w.members.owner.id] },
      mail,
    );
    expect(mail.sent.map((m) => m.to)).toEqual([w.members.owner.email]);
    mail.sent.length = 0;
    await changeReview(db, w.members.owner, w.slug, w.scenarioId, 2, { action: "approve" }, mail);
    expect(mail.sent[0].subject).toMatch(/^Approved:/);
    const history = await reviewHistory(db, w.members.viewer, w.slug, w.scenarioId, 2);
    expect(history.history.map((e) => `${e.from}>${e.to}`)).toEqual([
      "draft>in_review",
      "in_review>changes_requested",
      "changes_requested>in_review",
      "in_review>approved",
    ]);
    expect(history.history[1]).toMatchObject({
      actor: { id: w.members.reviewer.id },
      note: "b too high",
      askedOf: [],
    });
    expect(history.history.map((e) => e.askedOf.map((p) => p.id))).toEqual([
      [w.members.reviewer.id],
      [],
      [w.members.owner.id],
      [],
    ]);
    expect(history.revision.review).toMatchObject({
      state: "approved",
      by: { id: w.members.owner.id },
    });
  });

  it("refuses moves that do not fit the state, and verdicts from editors", async () => {
    const w = await makeWorld(db);
    const mail = recordingMailer();
    const review = (who: keyof typeof w.members, action: string) =>
      outcome(
        changeReview(
          db,
          w.members[who],
          w.slug,
          w.scenarioId,
          1,
          action === "request" ? { action, reviewers: [w.members.reviewer.id] } : { action },
          mail,
        ),
      );
    expect(await review("reviewer", "approve")).toBe("conflict:review");
    expect(await review("reviewer", "request")).toBe("forbidden:review");
    expect(await review("editor", "request")).toBe(null);
    expect(await review("editor", "request")).toBe("conflict:review");
    expect(await review("editor", "approve")).toBe("forbidden:review");
    expect(await review("viewer", "approve")).toBe("forbidden:review");
    expect(await review("reviewer", "approve")).toBe(null);
    expect(await review("owner", "request-changes")).toBe("conflict:review");
    const history = await reviewHistory(db, w.members.viewer, w.slug, w.scenarioId, 1);
    expect(history.history).toHaveLength(2);
  });

  it("two verdicts at once: one lands, the other is told the state moved", async () => {
    const w = await makeWorld(db);
    await changeReview(
      db,
      w.members.editor,
      w.slug,
      w.scenarioId,
      1,
      { action: "request", reviewers: [w.members.reviewer.id] },
      recordingMailer(),
    );
    const results = await Promise.all([
      outcome(
        changeReview(
          db,
          w.members.reviewer,
          w.slug,
          w.scenarioId,
          1,
          { action: "approve" },
          recordingMailer(),
        ),
      ),
      outcome(
        changeReview(
          db,
          w.members.owner,
          w.slug,
          w.scenarioId,
          1,
          { action: "request-changes" },
          recordingMailer(),
        ),
      ),
    ]);
    expect(results.sort()).toEqual(["conflict:review", null].sort());
    const history = await reviewHistory(db, w.members.viewer, w.slug, w.scenarioId, 1);
    expect(history.history).toHaveLength(2);
  });

  it("a failing mailer never undoes the verdict", async () => {
    const w = await makeWorld(db);
    const broken = {
      appUrl: "http://app.test",
      mailer: {
        send: async () => {
          throw new Error("smtp down");
        },
      },
    };
    const quiet = console.error;
    console.error = () => {};
    try {
      const result = await changeReview(
        db,
        w.members.editor,
        w.slug,
        w.scenarioId,
        1,
        { action: "request", reviewers: [w.members.reviewer.id] },
        broken,
      );
      expect(result.notified).toBe(0);
      expect(result.revision.review.state).toBe("in_review");
    } finally {
      console.error = quiet;
    }
  });
});

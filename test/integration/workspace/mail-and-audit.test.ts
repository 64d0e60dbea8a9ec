import { describe, expect, it } from "vitest";

import * as reviewRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/review/route";
import { listAuditLog } from "@/lib/server/workspace/audit-log";
import { addComment } from "@/lib/server/workspace/comments";
import { updateParameterSet } from "@/lib/server/workspace/parameter-sets";
import { changeReview } from "@/lib/server/workspace/review";
import { saveRevision } from "@/lib/server/workspace/revisions";
import { updateScenario } from "@/lib/server/workspace/scenarios";
import { revokeShareLink } from "@/lib/server/workspace/share-links";
import { readMail } from "@/test/e2e/support/mail";

import { openTestDb, recordingMailer } from "../support/db";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  demoFileWith,
  makeWorld,
} from "../support/workspace";

const db = openTestDb();
closeAppPoolAfterAll();

describe("review mail through the real transport", () => {
  // scripts/test.sh runs the fake SMTP server and sets MAIL_OUTBOX_DIR; without it there is
  // no mailbox to read.
  it.runIf(process.env.MAIL_OUTBOX_DIR)(
    "the editor's verdict mail arrives in the outbox",
    async () => {
      const w = await makeWorld(db);
      const params = { team: w.slug, scenario: w.scenarioId, number: "1" };
      const ask = await callRoute(reviewRoute.POST, {
        method: "POST",
        params,
        cookie: await cookieFor(db, w.members.editor),
        body: { action: "request", reviewers: [w.members.reviewer.id] },
      });
      expect(ask.status).toBe(200);
      const verdict = await callRoute(reviewRoute.POST, {
        method: "POST",
        params,
        cookie: await cookieFor(db, w.members.reviewer),
        body: { action: "approve", note: "good fit" },
      });
      expect(verdict.status).toBe(200);
      expect(verdict.body.notified).toBeGreaterThan(0);
      const mail = await readMail({ to: w.members.editor.email, subject: "Approved:" });
      expect(mail.text).toContain("good fit");
      expect(mail.text).toContain(`/teams/${w.slug}/scenarios/${w.scenarioId}?rev=1`);
    },
  );
});

describe("audit trail", () => {
  it("records each workspace mutation with its actor", async () => {
    const w = await makeWorld(db);
    const { editor, reviewer, owner } = w.members;
    await updateScenario(db, editor, w.slug, w.scenarioId, { tags: ["x"] });
    await saveRevision(db, editor, w.slug, w.scenarioId, {
      baseRevision: 1,
      file: demoFileWith(12000),
    });
    await addComment(db, reviewer, w.slug, w.scenarioId, 2, { body: "ok" });
    await changeReview(
      db,
      editor,
      w.slug,
      w.scenarioId,
      2,
      { action: "request", reviewers: [reviewer.id] },
      recordingMailer(),
    );
    await changeReview(
      db,
      owner,
      w.slug,
      w.scenarioId,
      2,
      { action: "approve" },
      recordingMailer(),
    );
    await updateParameterSet(db, editor, w.slug, w.setId, { name: "renamed" });
    await revokeShareLink(db, editor, w.slug, w.linkId);
    const log = await listAuditLog(db, w.members.viewer, w.slug, { pageSize: "50" });
    const actions = log.items.map((e) => `${e.action}:${e.actor?.name}`).reverse();
    expect(actions).toEqual([
      "team.create:Owner",
      "scenario.create:editor",
      "parameter-set.create:editor",
      "comment.create:reviewer",
      "share-link.create:editor",
      "scenario.update:editor",
      "revision.save:editor",
      "comment.create:reviewer",
      "review.request:editor",
      "review.approve:Owner",
      "parameter-set.update:editor",
      "share-link.revoke:editor",
    ]);
    expect(log.total).toBe(12);
  });
});

import { randomUUID } from "node:crypto";

import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { listAwaitingReview } from "@/db/queries/awaiting-review";
import { reviewEvents } from "@/db/schema/scenarios";
import { memberships } from "@/db/schema/teams";
import { isAppError } from "@/lib/shared/errors";
import { changeReview, reviewHistory } from "@/lib/server/workspace/review";
import * as reviewRoute from "@/app/api/v1/teams/[team]/scenarios/[scenario]/revisions/[number]/review/route";

import { makeUser, openTestDb, recordingMailer } from "../support/db";
import {
  callRoute,
  closeAppPoolAfterAll,
  cookieFor,
  makeWorld,
  type World,
} from "../support/workspace";

// Issue 13 item 6: a review request names whom it is asked of, among the team's reviewers
// and owners; only they are mailed and only they find it under "awaiting my review".
const db = openTestDb();
closeAppPoolAfterAll();

async function refusal(promise: Promise<unknown>) {
  try {
    await promise;
  } catch (error) {
    if (isAppError(error)) return { code: error.code, message: error.message, field: error.field };
    throw error;
  }
  throw new Error("expected the request to be refused");
}

async function awaiting(w: World, userId: string) {
  return (await listAwaitingReview(db, { teamId: w.teamId, userId })).map((r) => r.number);
}

describe("choosing reviewers when asking for a review", () => {
  it("mails only the chosen reviewer and lists it only for them; the requester is never mailed", async () => {
    const w = await makeWorld(db);
    const rolf = await makeUser(db, { name: "Rolf Second-Reviewer" });
    await db.insert(memberships).values({ teamId: w.teamId, userId: rolf.id, role: "reviewer" });
    const mail = recordingMailer();

    const asked = await changeReview(
      db,
      w.members.editor,
      w.slug,
      w.scenarioId,
      1,
      { action: "request", note: "damage threshold looks low", reviewers: [rolf.id] },
      mail,
    );
    expect(mail.sent.map((m) => m.to)).toEqual([rolf.email]);
    expect(asked.notified).toBe(1);
    expect(await awaiting(w, rolf.id)).toEqual([1]);
    // The reviewer and the owner give verdicts but were not chosen: no mail, no entry.
    expect(await awaiting(w, w.members.reviewer.id)).toEqual([]);
    expect(await awaiting(w, w.members.owner.id)).toEqual([]);
    const history = await reviewHistory(db, w.members.viewer, w.slug, w.scenarioId, 1);
    expect(history.history.map((e) => e.askedOf)).toEqual([[{ id: rolf.id, name: rolf.name }]]);

    // A verdict still goes to the editors and the requester, as before.
    mail.sent.length = 0;
    await changeReview(db, rolf, w.slug, w.scenarioId, 1, { action: "request-changes" }, mail);
    expect(mail.sent.map((m) => m.to)).toEqual([w.members.editor.email]);
    expect(await awaiting(w, rolf.id)).toEqual([]);
  });

  it("an owner asking chooses among the others; choosing themself is refused", async () => {
    const w = await makeWorld(db);
    const mail = recordingMailer();
    const self = await refusal(
      changeReview(
        db,
        w.members.owner,
        w.slug,
        w.scenarioId,
        1,
        { action: "request", reviewers: [w.members.reviewer.id, w.members.owner.id] },
        mail,
      ),
    );
    expect(self).toEqual({
      code: "invalid:reviewers",
      message: "You cannot review your own request: choose someone else.",
      field: "reviewers",
    });
    await changeReview(
      db,
      w.members.owner,
      w.slug,
      w.scenarioId,
      1,
      { action: "request", reviewers: [w.members.reviewer.id] },
      mail,
    );
    expect(mail.sent.map((m) => m.to)).toEqual([w.members.reviewer.email]);
  });

  it("refuses a forged id, a non-member, an editor or viewer, and an empty choice, changing nothing", async () => {
    const w = await makeWorld(db);
    const secondEditor = await makeUser(db, { name: "Erika Editor" });
    await db
      .insert(memberships)
      .values({ teamId: w.teamId, userId: secondEditor.id, role: "editor" });
    const mail = recordingMailer();
    const ask = (reviewers: unknown) =>
      refusal(
        changeReview(
          db,
          w.members.editor,
          w.slug,
          w.scenarioId,
          1,
          { action: "request", reviewers },
          mail,
        ),
      );
    const noName = "One of the chosen people is not a reviewer of this team.";
    expect(await ask([randomUUID()])).toMatchObject({ code: "invalid:reviewers", message: noName });
    // Someone with an account in another team: refused without saying who they are.
    expect(await ask([w.members.reviewer.id, w.outsider.id])).toMatchObject({
      code: "invalid:reviewers",
      message: noName,
    });
    expect(await ask([secondEditor.id])).toEqual({
      code: "invalid:reviewers",
      message: "Erika Editor is not a reviewer of this team.",
      field: "reviewers",
    });
    expect((await ask([w.members.viewer.id])).message).toBe(
      "viewer is not a reviewer of this team.",
    );
    expect(await ask([])).toMatchObject({
      code: "invalid:reviewers",
      message: "reviewers: Choose at least one reviewer.",
    });
    expect((await ask(undefined)).message).toBe("reviewers: Choose at least one reviewer.");
    expect((await ask(["not-an-id"])).code).toBe("invalid:reviewers");

    const history = await reviewHistory(db, w.members.viewer, w.slug, w.scenarioId, 1);
    expect(history.revision.review.state).toBe("draft");
    expect(history.history).toEqual([]);
    expect(mail.sent).toEqual([]);
  });

  it("through the API: 400 with the message and the field", async () => {
    const w = await makeWorld(db);
    const res = await callRoute(reviewRoute.POST, {
      method: "POST",
      params: { team: w.slug, scenario: w.scenarioId, number: "1" },
      cookie: await cookieFor(db, w.members.editor),
      body: { action: "request", reviewers: [w.members.viewer.id] },
    });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({
      code: "invalid:reviewers",
      message: "viewer is not a reviewer of this team.",
      path: "reviewers",
    });
  });

  it("a chosen reviewer who stops reviewing no longer sees it; a request that chose nobody awaits all", async () => {
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
    expect(await awaiting(w, w.members.reviewer.id)).toEqual([1]);
    const { revision } = await reviewHistory(db, w.members.viewer, w.slug, w.scenarioId, 1);
    const thisRequest = eq(reviewEvents.revisionId, revision.id);
    // A request without a choice, as imported history or a request from before the choice
    // existed has it, keeps the old rule: every reviewer and owner.
    await db.update(reviewEvents).set({ chosenReviewers: [] }).where(thisRequest);
    expect(await awaiting(w, w.members.owner.id)).toEqual([1]);
    await db
      .update(reviewEvents)
      .set({ chosenReviewers: [w.members.reviewer.id] })
      .where(thisRequest);
    await db
      .update(memberships)
      .set({ role: "viewer" })
      .where(and(eq(memberships.teamId, w.teamId), eq(memberships.userId, w.members.reviewer.id)));
    expect(await awaiting(w, w.members.reviewer.id)).toEqual([]);
  });
});

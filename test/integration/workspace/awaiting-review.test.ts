import { describe, expect, it } from "vitest";

import { listAwaitingReview } from "@/db/queries/awaiting-review";
import { listReviewerChoices } from "@/db/queries/team-reviewers";
import { memberships } from "@/db/schema/teams";
import { changeReview } from "@/lib/server/workspace/review";
import { saveRevision } from "@/lib/server/workspace/revisions";

import { openTestDb, recordingMailer } from "../support/db";
import { demoFileWith, makeWorld } from "../support/workspace";

const db = openTestDb();

type World = Awaited<ReturnType<typeof makeWorld>>;

/** Asks every reviewer and owner of the team but the requester (the choice the form offers). */
async function request(w: World, who: "editor" | "owner", n: number) {
  const everyone = await listReviewerChoices(db, w.teamId, w.members[who].id);
  return changeReview(
    db,
    w.members[who],
    w.slug,
    w.scenarioId,
    n,
    { action: "request", reviewers: everyone.map((p) => p.id) },
    recordingMailer(),
  );
}

describe("awaiting my review: the team overview's list", () => {
  it("shows a reviewer what waits for them; not the requester, a viewer or an editor", async () => {
    const w = await makeWorld(db);
    const before = Date.now();
    await request(w, "editor", 1);

    const forReviewer = await listAwaitingReview(db, {
      teamId: w.teamId,
      userId: w.members.reviewer.id,
    });
    expect(forReviewer).toHaveLength(1);
    expect(forReviewer[0]).toMatchObject({
      scenarioId: w.scenarioId,
      number: 1,
      requestedBy: { id: w.members.editor.id, name: w.members.editor.name },
    });
    expect(Date.parse(forReviewer[0].requestedAt!)).toBeGreaterThanOrEqual(before - 1000);
    // Owners give verdicts too.
    expect(
      await listAwaitingReview(db, { teamId: w.teamId, userId: w.members.owner.id }),
    ).toHaveLength(1);
    // The requester does not judge their own request; viewers and editors give no verdicts.
    for (const who of ["editor", "viewer"] as const) {
      expect(await listAwaitingReview(db, { teamId: w.teamId, userId: w.members[who].id })).toEqual(
        [],
      );
    }
  });

  it("leaves out what the user requested themselves and what is no longer in review", async () => {
    const w = await makeWorld(db);
    await saveRevision(db, w.members.owner, w.slug, w.scenarioId, {
      baseRevision: 1,
      file: demoFileWith(12500),
    });
    await request(w, "editor", 1);
    await request(w, "owner", 2);

    const ownerSees = await listAwaitingReview(db, {
      teamId: w.teamId,
      userId: w.members.owner.id,
    });
    expect(ownerSees.map((r) => r.number)).toEqual([1]);
    const reviewerSees = await listAwaitingReview(db, {
      teamId: w.teamId,
      userId: w.members.reviewer.id,
    });
    expect(reviewerSees.map((r) => r.number).sort()).toEqual([1, 2]);

    await changeReview(
      db,
      w.members.reviewer,
      w.slug,
      w.scenarioId,
      1,
      { action: "approve" },
      recordingMailer(),
    );
    const afterVerdict = await listAwaitingReview(db, {
      teamId: w.teamId,
      userId: w.members.reviewer.id,
    });
    expect(afterVerdict.map((r) => r.number)).toEqual([2]);
  });

  it("never shows another team's reviews, even to someone who reviews in both", async () => {
    const a = await makeWorld(db);
    const b = await makeWorld(db);
    await db
      .insert(memberships)
      .values({ teamId: b.teamId, userId: a.members.reviewer.id, role: "reviewer" });
    await request(b, "editor", 1);

    expect(
      await listAwaitingReview(db, { teamId: a.teamId, userId: a.members.reviewer.id }),
    ).toEqual([]);
    const inB = await listAwaitingReview(db, { teamId: b.teamId, userId: a.members.reviewer.id });
    expect(inB.map((r) => r.scenarioId)).toEqual([b.scenarioId]);
    // Not a member of team b at all: nothing, whatever the team id asked for.
    expect(await listAwaitingReview(db, { teamId: b.teamId, userId: a.members.owner.id })).toEqual(
      [],
    );
    expect(await listAwaitingReview(db, { teamId: b.teamId, userId: b.outsider.id })).toEqual([]);
  });
});

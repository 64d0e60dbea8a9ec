import "server-only";

import type { Db } from "@/db/client";
import {
  findRevisionMeta,
  listReviewEvents,
  type ReviewEventView,
  type RevisionMeta,
} from "@/db/queries/revisions";
import {
  findLastReviewRequester,
  insertReviewEvent,
  moveReviewState,
  setLatestReviewStateIfLatest,
} from "@/db/queries/reviews";
import type { ReviewState } from "@/db/schema/scenarios";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { can, type Capability } from "@/lib/shared/permissions";
import type { MailDeps } from "@/lib/shared/mail-types";
import { AppError } from "@/lib/shared/errors";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { reviewActionSchema } from "@/lib/shared/validations/workspace";

import { parseWithPath } from "./parse";
import { checkChosenReviewers } from "./chosen-reviewers";
import { sendReviewMail } from "./review-mail";
import { revisionInTeam } from "../access/scope";

export interface ReviewHistoryResponse {
  revision: RevisionMeta;
  history: ReviewEventView[];
}
/** mailQueued: mails kept in the outbox because the mail server was down; sent when it is back. */
export type ReviewActionResponse = ReviewHistoryResponse & { notified: number; mailQueued: number };

// Editors send their work for review; reviewers (and owners) judge it.
const TRANSITIONS: Record<
  "request" | "approve" | "request-changes",
  { from: ReviewState[]; to: ReviewState; capability: Capability }
> = {
  request: { from: ["draft", "changes_requested"], to: "in_review", capability: "scenario:edit" },
  approve: { from: ["in_review"], to: "approved", capability: "review:verdict" },
  "request-changes": {
    from: ["in_review"],
    to: "changes_requested",
    capability: "review:verdict",
  },
};

const STATE_WORDS: Record<ReviewState, string> = {
  draft: "a draft",
  in_review: "in review",
  approved: "approved",
  changes_requested: "waiting for changes",
};

export async function reviewHistory(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  number: unknown,
): Promise<ReviewHistoryResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const { scenario, revision } = await revisionInTeam(db, ctx.team.id, scenarioId, number);
  const [meta, history] = await Promise.all([
    findRevisionMeta(db, scenario.id, revision.number),
    listReviewEvents(db, revision.id),
  ]);
  return { revision: meta!, history };
}

/** Moves a revision's review state; the move is a compare-and-set on the state it was in. */
export async function changeReview(
  db: Db,
  actor: Actor,
  teamSlug: string,
  scenarioId: unknown,
  number: unknown,
  input: unknown,
  deps: MailDeps,
): Promise<ReviewActionResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const { scenario, revision } = await revisionInTeam(db, ctx.team.id, scenarioId, number);
  const data = parseWithPath(reviewActionSchema, input);
  const step = TRANSITIONS[data.action];
  if (!can(ctx.role, step.capability)) {
    throw new AppError(
      "forbidden:review",
      step.capability === "review:verdict"
        ? "Only reviewers and owners give verdicts."
        : "Only editors and owners ask for a review.",
    );
  }
  const refused = new AppError(
    "conflict:review",
    `Revision ${revision.number} is ${STATE_WORDS[revision.reviewState]}; it cannot be ${data.action === "request" ? "sent for review" : "judged"} now.`,
  );
  if (!step.from.includes(revision.reviewState)) throw refused;
  const chosenReviewers =
    data.action === "request"
      ? await checkChosenReviewers(db, ctx.team.id, ctx.actor.id, data.reviewers)
      : [];
  const now = new Date();
  const requesterId = await db.transaction(async (tx) => {
    const moved = await moveReviewState(tx, revision.id, revision.reviewState, {
      to: step.to,
      by: ctx.actor.id,
      at: now,
    });
    // Someone else moved it between our read and this write.
    if (moved.length === 0) throw refused;
    // The list shows the newest revision's state; a concurrent save of a newer revision
    // makes this condition false, and the new revision's "draft" stands.
    await setLatestReviewStateIfLatest(tx, scenario.id, revision.number, step.to);
    const lastRequest = await findLastReviewRequester(tx, revision.id);
    await insertReviewEvent(tx, {
      revisionId: revision.id,
      fromState: revision.reviewState,
      toState: step.to,
      actorId: ctx.actor.id,
      note: data.note,
      at: now,
      chosenReviewers,
    });
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: `review.${data.action}`,
      target: scenario.id,
      detail: {
        revision: revision.number,
        from: revision.reviewState,
        to: step.to,
        ...(chosenReviewers.length ? { reviewers: chosenReviewers } : {}),
      },
    });
    return lastRequest?.actorId ?? null;
  });
  const { notified, queued } = await sendReviewMail(db, deps, {
    team: ctx.team,
    scenario,
    revision: revision.number,
    actorId: ctx.actor.id,
    actorName: ctx.actor.name,
    note: data.note,
    to: step.to,
    requesterId,
    chosenReviewers,
  });
  return {
    ...(await reviewHistory(db, actor, teamSlug, scenario.id, revision.number)),
    notified,
    mailQueued: queued,
  };
}

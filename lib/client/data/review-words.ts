import type { ReviewAction, ReviewState } from "./types";

export const REVIEW_STATE_LABELS: Record<ReviewState, string> = {
  draft: "Draft",
  in_review: "In review",
  approved: "Approved",
  changes_requested: "Changes requested",
};

export const REVIEW_STATES = Object.keys(REVIEW_STATE_LABELS) as ReviewState[];

export function isReviewState(value: unknown): value is ReviewState {
  return typeof value === "string" && value in REVIEW_STATE_LABELS;
}

export function reviewStateLabel(state: string): string {
  return isReviewState(state) ? REVIEW_STATE_LABELS[state] : state;
}

export interface ReviewPowers {
  /** scenario:edit — may send a revision for review. */
  canRequest: boolean;
  /** review:verdict — reviewers and owners. */
  canJudge: boolean;
}

/**
 * The review buttons a person sees on a revision in a given state. A courtesy only: the server
 * checks role and state again (and answers 409 if someone moved the review meanwhile).
 */
export function reviewActionsFor(state: ReviewState, powers: ReviewPowers): ReviewAction[] {
  const out: ReviewAction[] = [];
  if (powers.canRequest && (state === "draft" || state === "changes_requested"))
    out.push("request");
  if (powers.canJudge && state === "in_review") out.push("approve", "request-changes");
  return out;
}

export const REVIEW_ACTION_LABELS: Record<ReviewAction, string> = {
  request: "Request review",
  approve: "Approve",
  "request-changes": "Request changes",
};

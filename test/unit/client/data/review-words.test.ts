import { describe, expect, it } from "vitest";

import { reviewActionsFor, reviewStateLabel } from "@/lib/client/data/review-words";

describe("review buttons per role and state", () => {
  const editor = { canRequest: true, canJudge: false };
  const reviewer = { canRequest: false, canJudge: true };
  const owner = { canRequest: true, canJudge: true };
  const viewer = { canRequest: false, canJudge: false };

  it("lets editors send drafts and returned work for review, nothing else", () => {
    expect(reviewActionsFor("draft", editor)).toEqual(["request"]);
    expect(reviewActionsFor("changes_requested", editor)).toEqual(["request"]);
    expect(reviewActionsFor("in_review", editor)).toEqual([]);
    expect(reviewActionsFor("approved", editor)).toEqual([]);
  });

  it("gives verdicts only on revisions in review, to reviewers and owners", () => {
    expect(reviewActionsFor("in_review", reviewer)).toEqual(["approve", "request-changes"]);
    expect(reviewActionsFor("draft", reviewer)).toEqual([]);
    expect(reviewActionsFor("in_review", owner)).toEqual(["approve", "request-changes"]);
    expect(reviewActionsFor("in_review", viewer)).toEqual([]);
  });

  it("names states in words and leaves unknown ones as they are", () => {
    expect(reviewStateLabel("changes_requested")).toBe("Changes requested");
    expect(reviewStateLabel("weird")).toBe("weird");
  });
});

"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { ReviewBadge } from "@/components/scenarios/review-badge";
import { Panel } from "@/components/ui/panel";
import { MAIL_QUEUED_NOTICE } from "@/lib/shared/mail-types";
import { ApiError, messageOf } from "@/lib/client/data/api-fetch";
import { formatWhen, personName } from "@/lib/client/data/format";
import { importedVerdictText } from "@/lib/shared/imported-names";
import {
  REVIEW_ACTION_LABELS,
  reviewActionsFor,
  reviewStateLabel,
} from "@/lib/client/data/review-words";
import type { PersonRef, ReviewAction, ReviewState } from "@/lib/client/data/types";
import { useReview, useReviewAction } from "@/lib/client/data/use-review";

import { CommentsSection } from "./comments-section";
import { ReviewHistoryList } from "./review-history-list";
import { ReviewerChoice } from "./reviewer-choice";

const CHOOSE_ONE = "Choose at least one reviewer.";

/** A refusal about the chosen reviewers belongs beside the checkboxes, not under the buttons. */
function isAboutReviewers(error: unknown): boolean {
  return error instanceof ApiError && error.code === "invalid:reviewers";
}

export interface ReviewPanelProps {
  slug: string;
  scenarioId: string;
  number: number;
  me: PersonRef;
  canRequest: boolean;
  canJudge: boolean;
  canComment: boolean;
  maxIncrement: number;
  /** The team's reviewers and owners, the viewer left out: whom a request may be asked of. */
  reviewerChoices?: PersonRef[];
}

/** The review of the revision on screen: its state, the buttons the role allows, the trail. */
export function ReviewPanel(props: ReviewPanelProps) {
  const { slug, scenarioId, number } = props;
  const review = useReview(slug, scenarioId, number);
  const act = useReviewAction(slug, scenarioId, number);
  const router = useRouter();
  const [note, setNote] = useState("");
  const [chosen, setChosen] = useState<string[]>([]);
  const [choiceError, setChoiceError] = useState<string | null>(null);
  const state = (review.data?.revision.review.state ?? "draft") as ReviewState;
  const actions = reviewActionsFor(state, props);
  // Nobody reviews their own request: the server refuses it, so the form never offers it.
  const choices = (props.reviewerChoices ?? []).filter((p) => p.id !== props.me.id);
  const reviewersError =
    choiceError ?? (act.isError && isAboutReviewers(act.error) ? messageOf(act.error) : null);

  const run = (action: ReviewAction) => {
    if (action === "request" && chosen.length === 0) {
      setChoiceError(CHOOSE_ONE);
      return;
    }
    setChoiceError(null);
    const input =
      action === "request"
        ? { action, note: note.trim(), reviewers: chosen }
        : { action, note: note.trim() };
    act.mutate(input, {
      onSuccess: () => {
        setNote("");
        setChosen([]);
        // The page header shows the state too: read it again from the server.
        router.refresh();
      },
    });
  };

  return (
    <Panel id="review" title={`Review of revision ${number}`} aside={<ReviewBadge state={state} />}>
      <div className="space-y-4 text-sm">
        {review.isError ? <p className="text-kiln-dark">{messageOf(review.error)}</p> : null}
        {review.data?.revision.review.importedBy != null && state !== "draft" ? (
          <p className="text-ink-soft" data-testid="review-summary">
            {importedVerdictText(state, review.data.revision.review.importedBy)}
          </p>
        ) : review.data?.revision.review.by && state !== "draft" ? (
          <p className="text-ink-soft" data-testid="review-summary">
            {reviewStateLabel(state)} — {personName(review.data.revision.review.by)},{" "}
            {formatWhen(review.data.revision.review.at)}
          </p>
        ) : null}
        {actions.length ? (
          <form
            className="space-y-2"
            onSubmit={(e) => e.preventDefault()}
            aria-label="Review action"
          >
            {actions.includes("request") ? (
              <ReviewerChoice
                choices={choices}
                chosen={chosen}
                onChange={(next) => {
                  setChosen(next);
                  if (next.length) setChoiceError(null);
                }}
                error={reviewersError}
                disabled={act.isPending}
              />
            ) : null}
            <label htmlFor="review-note" className="block font-medium">
              Note with the {props.canJudge && state === "in_review" ? "verdict" : "request"}{" "}
              (optional)
            </label>
            <textarea
              id="review-note"
              value={note}
              maxLength={2000}
              rows={2}
              onChange={(e) => setNote(e.target.value)}
              className="block w-full rounded-md border border-glaze-line bg-white px-3 py-2"
            />
            <div className="flex flex-wrap gap-2">
              {actions.map((action) => (
                <button
                  key={action}
                  type="button"
                  disabled={act.isPending}
                  onClick={() => run(action)}
                  className={`rounded-md px-3 py-1.5 text-white disabled:opacity-60 ${
                    action === "request-changes"
                      ? "bg-kiln hover:bg-kiln-dark"
                      : "bg-verdigris hover:bg-verdigris-dark"
                  }`}
                >
                  {REVIEW_ACTION_LABELS[action]}
                </button>
              ))}
            </div>
          </form>
        ) : null}
        {act.isError && !isAboutReviewers(act.error) ? (
          <p role="alert" className="text-kiln-dark">
            {messageOf(act.error)}
          </p>
        ) : null}
        {act.isSuccess && act.data.notified > 0 ? (
          <p role="status" className="text-verdigris-dark">
            {act.data.notified === 1 ? "One person was" : `${act.data.notified} people were`} told
            by e-mail.
          </p>
        ) : null}
        {act.isSuccess && act.data.mailQueued > 0 ? (
          <p role="status" className="text-verdigris-dark">
            {MAIL_QUEUED_NOTICE}
          </p>
        ) : null}
        <ReviewHistoryList history={review.data?.history ?? []} />
        <CommentsSection {...props} />
      </div>
    </Panel>
  );
}

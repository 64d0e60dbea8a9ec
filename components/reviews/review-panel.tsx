"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

import { ReviewBadge } from "@/components/scenarios/review-badge";
import { Panel } from "@/components/ui/panel";
import { MAIL_QUEUED_NOTICE } from "@/lib/shared/mail-types";
import { messageOf } from "@/lib/client/data/api-fetch";
import { formatWhen, personName } from "@/lib/client/data/format";
import { importedPersonText, importedVerdictText } from "@/lib/shared/imported-names";
import {
  REVIEW_ACTION_LABELS,
  reviewActionsFor,
  reviewStateLabel,
} from "@/lib/client/data/review-words";
import type { PersonRef, ReviewState } from "@/lib/client/data/types";
import { useReview, useReviewAction } from "@/lib/client/data/use-review";

import { CommentsSection } from "./comments-section";

export interface ReviewPanelProps {
  slug: string;
  scenarioId: string;
  number: number;
  me: PersonRef;
  canRequest: boolean;
  canJudge: boolean;
  canComment: boolean;
  maxIncrement: number;
}

/** The review of the revision on screen: its state, the buttons the role allows, the trail. */
export function ReviewPanel(props: ReviewPanelProps) {
  const { slug, scenarioId, number } = props;
  const review = useReview(slug, scenarioId, number);
  const act = useReviewAction(slug, scenarioId, number);
  const router = useRouter();
  const [note, setNote] = useState("");
  const state = (review.data?.revision.review.state ?? "draft") as ReviewState;
  const actions = reviewActionsFor(state, props);

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
                  onClick={() =>
                    act.mutate(
                      { action, note: note.trim() },
                      {
                        onSuccess: () => {
                          setNote("");
                          // The page header shows the state too: read it again from the server.
                          router.refresh();
                        },
                      },
                    )
                  }
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
        {act.isError ? (
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
        {review.data?.history.length ? (
          <ol className="space-y-1 border-l-2 border-glaze-line pl-3" aria-label="Review history">
            {review.data.history.map((h) => (
              <li key={h.id}>
                <span className="font-medium">
                  {h.importedActor != null
                    ? importedPersonText(h.importedActor)
                    : personName(h.actor)}
                </span>{" "}
                {reviewStateLabel(h.from)} → {reviewStateLabel(h.to)}
                <span className="text-ink-faint">, {formatWhen(h.at)}</span>
                {h.note ? <p className="whitespace-pre-wrap text-ink-soft">{h.note}</p> : null}
              </li>
            ))}
          </ol>
        ) : null}
        <CommentsSection {...props} />
      </div>
    </Panel>
  );
}

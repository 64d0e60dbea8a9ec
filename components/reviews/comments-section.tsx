"use client";

import { messageOf } from "@/lib/client/data/api-fetch";
import { countComments } from "@/lib/client/data/optimistic-comments";
import type { PersonRef } from "@/lib/client/data/types";
import { useAddComment, useComments } from "@/lib/client/data/use-comments";

import { CommentForm } from "./comment-form";
import { CommentItem } from "./comment-item";

export interface CommentsSectionProps {
  slug: string;
  scenarioId: string;
  number: number;
  me: PersonRef;
  canComment: boolean;
  maxIncrement: number;
}

/** Threaded comments on one revision; a new comment shows at once and is saved behind it. */
export function CommentsSection({
  slug,
  scenarioId,
  number,
  me,
  canComment,
  maxIncrement,
}: CommentsSectionProps) {
  const comments = useComments(slug, scenarioId, number);
  const add = useAddComment(slug, scenarioId, number, me);
  const threads = comments.data?.items ?? [];
  return (
    <section aria-labelledby="comments-title" className="space-y-3 border-t border-glaze-line pt-3">
      <h3 id="comments-title" className="font-semibold">
        Comments ({countComments(threads)})
      </h3>
      {comments.isError ? <p className="text-kiln-dark">{messageOf(comments.error)}</p> : null}
      {comments.data && threads.length === 0 ? (
        <p className="text-ink-soft">No comments on this revision yet.</p>
      ) : null}
      <ul className="space-y-3" data-testid="comment-list">
        {threads.map((c) => (
          <CommentItem
            key={c.id}
            comment={c}
            canReply={canComment}
            maxIncrement={maxIncrement}
            onReply={(input) => add.mutate(input)}
          />
        ))}
      </ul>
      {add.isError ? (
        <p role="alert" className="text-kiln-dark">
          Your comment was not saved: {messageOf(add.error)}
        </p>
      ) : null}
      {canComment ? (
        <CommentForm
          idPrefix="new-comment"
          label="Add a comment"
          submitLabel="Comment"
          maxIncrement={maxIncrement}
          onSubmit={(input) => add.mutate(input)}
        />
      ) : null}
    </section>
  );
}

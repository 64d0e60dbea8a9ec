"use client";

import { useState } from "react";

import { formatWhen, personName } from "@/lib/client/data/format";
import { isPending, type NewComment } from "@/lib/client/data/optimistic-comments";
import { useIncrementCursor } from "@/lib/client/loading-desk/increment-cursor-store";
import type { CommentNode } from "@/lib/client/data/types";
import { importedPersonText } from "@/lib/shared/imported-names";

import { CommentForm } from "./comment-form";

export interface CommentItemProps {
  comment: CommentNode;
  canReply: boolean;
  maxIncrement: number;
  onReply: (input: NewComment) => void;
}

/** One comment (text only, never markup) with its replies below it. */
export function CommentItem({ comment, canReply, maxIncrement, onReply }: CommentItemProps) {
  const [replying, setReplying] = useState(false);
  const pending = isPending(comment);
  return (
    <li className={pending ? "opacity-60" : undefined} data-testid="comment">
      <p className="text-xs text-ink-faint">
        <span className="font-medium text-ink">
          {comment.importedAuthor != null
            ? importedPersonText(comment.importedAuthor)
            : personName(comment.author)}
        </span>
        , {pending ? "sending…" : formatWhen(comment.createdAt)}
        {comment.editedAt ? " (edited)" : ""}
        {comment.increment !== null ? <PinnedIncrement increment={comment.increment} /> : null}
      </p>
      <p className="whitespace-pre-wrap">{comment.body}</p>
      {canReply && !pending && !replying ? (
        <button
          type="button"
          onClick={() => setReplying(true)}
          className="text-xs text-verdigris-dark hover:underline"
        >
          Reply
        </button>
      ) : null}
      {replying ? (
        <div className="ml-4 mt-2">
          <CommentForm
            idPrefix={`reply-${comment.id}`}
            label={`Reply to ${personName(comment.author)}`}
            submitLabel="Reply"
            parentId={comment.id}
            maxIncrement={maxIncrement}
            onSubmit={(input) => {
              onReply(input);
              setReplying(false);
            }}
            onCancel={() => setReplying(false)}
          />
        </div>
      ) : null}
      {comment.replies.length ? (
        <ul className="ml-4 mt-2 space-y-2 border-l-2 border-glaze-line pl-3">
          {comment.replies.map((r) => (
            <CommentItem
              key={r.id}
              comment={r}
              canReply={canReply}
              maxIncrement={maxIncrement}
              onReply={onReply}
            />
          ))}
        </ul>
      ) : null}
    </li>
  );
}

/**
 * The increment a comment is pinned to: a button that moves the loading desk's increment cursor
 * there, so every chart marks that increment, and brings the cursor into view.
 */
function PinnedIncrement({ increment }: { increment: number }) {
  const [cursor, setCursor] = useIncrementCursor();
  const shown = cursor === increment;
  return (
    <button
      type="button"
      aria-pressed={shown}
      title={`Move the increment cursor to increment ${increment} and mark it on the charts`}
      onClick={() => {
        setCursor(increment);
        document.getElementById("increment-cursor")?.scrollIntoView?.({ block: "center" });
      }}
      className={`ml-2 rounded px-1.5 underline-offset-2 hover:underline ${shown ? "bg-verdigris text-white" : "bg-verdigris-light text-verdigris-dark"}`}
    >
      at increment {increment}
    </button>
  );
}

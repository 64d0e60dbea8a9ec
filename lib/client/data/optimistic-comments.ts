import type { CommentNode, PersonRef } from "./types";

const PENDING_PREFIX = "pending-";

export interface NewComment {
  body: string;
  parentId?: string;
  increment?: number;
}

/** The threads with a not-yet-saved comment added where the server will put it. */
export function withPendingComment(
  threads: CommentNode[],
  input: NewComment,
  author: PersonRef,
  tempId: string,
  now: string,
): CommentNode[] {
  const node: CommentNode = {
    id: `${PENDING_PREFIX}${tempId}`,
    parentId: input.parentId ?? null,
    author,
    body: input.body,
    increment: input.increment ?? null,
    importedAuthor: null,
    createdAt: now,
    editedAt: null,
    replies: [],
  };
  if (!input.parentId) return [...threads, node];
  let placed = false;
  const insert = (nodes: CommentNode[]): CommentNode[] =>
    nodes.map((n) => {
      if (n.id === input.parentId) {
        placed = true;
        return { ...n, replies: [...n.replies, node] };
      }
      return n.replies.length ? { ...n, replies: insert(n.replies) } : n;
    });
  const out = insert(threads);
  return placed ? out : [...out, node];
}

export function isPending(comment: { id: string }): boolean {
  return comment.id.startsWith(PENDING_PREFIX);
}

export function countComments(threads: CommentNode[]): number {
  return threads.reduce((n, t) => n + 1 + countComments(t.replies), 0);
}

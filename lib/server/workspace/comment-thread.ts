import "server-only";

import type { CommentView } from "@/db/queries/comments";

export type CommentNode = CommentView & { replies: CommentNode[] };

/** Flat rows (oldest first) → threads; a reply whose parent is missing is kept at the top. */
export function toThreads(rows: CommentView[]): CommentNode[] {
  const nodes = new Map(rows.map((r) => [r.id, { ...r, replies: [] as CommentNode[] }]));
  const roots: CommentNode[] = [];
  for (const node of nodes.values()) {
    const parent = node.parentId ? nodes.get(node.parentId) : undefined;
    (parent ? parent.replies : roots).push(node);
  }
  return roots;
}

import { describe, expect, it } from "vitest";

import {
  countComments,
  isPending,
  withPendingComment,
} from "@/lib/client/data/optimistic-comments";
import type { CommentNode } from "@/lib/client/data/types";

const me = { id: "me", name: "Rita" };
const node = (id: string, replies: CommentNode[] = []): CommentNode => ({
  id,
  parentId: null,
  author: me,
  body: id,
  importedAuthor: null,
  increment: null,
  createdAt: "2026-01-01T00:00:00.000Z",
  editedAt: null,
  replies,
});

describe("optimistic comments", () => {
  it("adds a new thread at the end", () => {
    const out = withPendingComment([node("a")], { body: "hi", increment: 12 }, me, "1", "t");
    expect(out.map((c) => c.id)).toEqual(["a", "pending-1"]);
    expect(out[1]).toMatchObject({ body: "hi", increment: 12, parentId: null });
    expect(isPending(out[1])).toBe(true);
  });

  it("puts a reply under its parent, however deep, without touching the input", () => {
    const threads = [node("a", [node("b")]), node("c")];
    const out = withPendingComment(threads, { body: "re", parentId: "b" }, me, "2", "t");
    expect(out[0].replies[0].replies.map((c) => c.id)).toEqual(["pending-2"]);
    expect(threads[0].replies[0].replies).toEqual([]);
    expect(countComments(out)).toBe(4);
  });

  it("keeps a reply to a vanished parent at the top rather than losing it", () => {
    const out = withPendingComment([node("a")], { body: "re", parentId: "gone" }, me, "3", "t");
    expect(out.map((c) => c.id)).toEqual(["a", "pending-3"]);
  });
});

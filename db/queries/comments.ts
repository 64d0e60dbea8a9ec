import { and, asc, eq } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { revisionComments } from "@/db/schema/comments";
import { users } from "@/db/schema/users";

import { personRef } from "./users-view";

export async function listCommentsOfRevision(db: Executor, revisionId: string) {
  const rows = await db
    .select({
      id: revisionComments.id,
      parentId: revisionComments.parentId,
      author: personRef(users.id, users.name),
      body: revisionComments.body,
      increment: revisionComments.increment,
      createdAt: revisionComments.createdAt,
      editedAt: revisionComments.editedAt,
      importedAuthor: revisionComments.importedAuthor,
    })
    .from(revisionComments)
    .leftJoin(users, eq(users.id, revisionComments.authorId))
    .where(eq(revisionComments.revisionId, revisionId))
    .orderBy(asc(revisionComments.createdAt), asc(revisionComments.id));
  return rows.map((r) => ({
    ...r,
    createdAt: r.createdAt.toISOString(),
    editedAt: r.editedAt?.toISOString() ?? null,
  }));
}
export type CommentView = Awaited<ReturnType<typeof listCommentsOfRevision>>[number];

export async function findCommentRow(db: Executor, revisionId: string, commentId: string) {
  const [row] = await db
    .select()
    .from(revisionComments)
    .where(and(eq(revisionComments.revisionId, revisionId), eq(revisionComments.id, commentId)));
  return row ?? null;
}

export type NewComment = typeof revisionComments.$inferInsert;

export async function insertComment(db: Executor, values: NewComment) {
  const [row] = await db
    .insert(revisionComments)
    .values(values)
    .returning({ id: revisionComments.id });
  return row;
}

export async function setCommentBody(db: Executor, commentId: string, body: string, at: Date) {
  await db
    .update(revisionComments)
    .set({ body, editedAt: at })
    .where(eq(revisionComments.id, commentId));
}

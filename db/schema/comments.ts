import {
  type AnyPgColumn,
  index,
  integer,
  pgTable,
  text,
  timestamp,
  uuid,
} from "drizzle-orm/pg-core";

import { scenarioRevisions } from "./scenarios";
import { users } from "./users";

// Threaded comments on one revision; a reply names its parent (same revision), and a comment
// may point at one increment of the path so a reader can find the spot on the curves.
export const revisionComments = pgTable(
  "revision_comments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    revisionId: uuid("revision_id")
      .notNull()
      .references(() => scenarioRevisions.id, { onDelete: "cascade" }),
    parentId: uuid("parent_id").references((): AnyPgColumn => revisionComments.id, {
      onDelete: "cascade",
    }),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    body: text("body").notNull(),
    increment: integer("increment"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    editedAt: timestamp("edited_at", { withTimezone: true }),
    // Imported comment: the author's name from the file, as text (author_id stays empty).
    importedAuthor: text("imported_author"),
  },
  (t) => [index("revision_comments_revision_idx").on(t.revisionId, t.createdAt)],
);

export type CommentRow = typeof revisionComments.$inferSelect;

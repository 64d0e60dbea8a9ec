import { and, eq, isNull } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { emailVerificationTokens, passwordResetTokens } from "@/db/schema/users";

// The single-use links of an account: address confirmation and password reset. Only hashes
// are stored; "consume" marks a link used once, so a double click counts once.

interface NewLinkToken {
  tokenHash: string;
  userId: string;
  expiresAt: Date;
}

export async function insertEmailVerificationToken(
  db: Executor,
  values: NewLinkToken,
): Promise<void> {
  await db.insert(emailVerificationTokens).values(values);
}

export async function findEmailVerificationToken(db: Executor, tokenHash: string) {
  const [row] = await db
    .select()
    .from(emailVerificationTokens)
    .where(eq(emailVerificationTokens.tokenHash, tokenHash));
  return row;
}

/** Marks an unused confirmation link used; false when it was used meanwhile. */
export async function consumeEmailVerificationToken(
  db: Executor,
  tokenHash: string,
  at: Date,
): Promise<boolean> {
  const consumed = await db
    .update(emailVerificationTokens)
    .set({ usedAt: at })
    .where(
      and(eq(emailVerificationTokens.tokenHash, tokenHash), isNull(emailVerificationTokens.usedAt)),
    )
    .returning({ userId: emailVerificationTokens.userId });
  return consumed.length > 0;
}

export async function insertPasswordResetToken(db: Executor, values: NewLinkToken): Promise<void> {
  await db.insert(passwordResetTokens).values(values);
}

export async function findPasswordResetToken(db: Executor, tokenHash: string) {
  const [row] = await db
    .select()
    .from(passwordResetTokens)
    .where(eq(passwordResetTokens.tokenHash, tokenHash));
  return row;
}

/** Marks an unused reset link used; false when it was used meanwhile. */
export async function consumePasswordResetToken(
  db: Executor,
  tokenHash: string,
  at: Date,
): Promise<boolean> {
  const consumed = await db
    .update(passwordResetTokens)
    .set({ usedAt: at })
    .where(and(eq(passwordResetTokens.tokenHash, tokenHash), isNull(passwordResetTokens.usedAt)))
    .returning({ userId: passwordResetTokens.userId });
  return consumed.length > 0;
}

/** Uses up every open reset link of the user. */
export async function useUpResetTokensOfUser(
  db: Executor,
  userId: string,
  at: Date,
): Promise<void> {
  await db
    .update(passwordResetTokens)
    .set({ usedAt: at })
    .where(and(eq(passwordResetTokens.userId, userId), isNull(passwordResetTokens.usedAt)));
}

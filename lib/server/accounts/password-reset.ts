import "server-only";

import type { Db } from "@/db/client";
import {
  consumePasswordResetToken,
  findPasswordResetToken,
  insertPasswordResetToken,
  useUpResetTokensOfUser,
} from "@/db/queries/account-tokens";
import {
  deleteSessionsOfUser,
  findUserByEmail,
  setUserPasswordReturningVerified,
  setUserVerifiedAt,
} from "@/db/queries/accounts";
import { recordAudit } from "@/lib/server/access/audit";
import { revokeApiTokensOfUser } from "@/db/queries/api-tokens";
import { hashPassword } from "@/lib/server/accounts/auth/password";
import { hashToken, looksLikeToken, newToken, tokenState } from "@/lib/server/accounts/auth/tokens";
import { queueMail } from "@/lib/server/email/mail-outbox";
import { resetPasswordMessage } from "@/lib/server/email/templates/reset";
import { linkTo, type MailDeps } from "@/lib/shared/mail-types";
import { AppError } from "@/lib/shared/errors";
import { enforceRateLimits, RATE_LIMITS } from "@/lib/server/access/rate-limit";
import { resetPasswordSchema, resetRequestSchema } from "@/lib/shared/validations/auth";
import { parseInput } from "@/lib/shared/validations/parse";

const MESSAGES = {
  unknown: "This reset link is not valid. Ask for a new one.",
  used: "This reset link was used already. Ask for a new one if you still need it.",
  expired: "This reset link has expired (links last one hour). Ask for a new one.",
};

/**
 * Queues a reset link when the account exists. The answer is the same either way so the form
 * cannot be used to learn who has an account; the limits still count every request. The mail
 * goes through the outbox (never sent inline), so a known address answers about as fast as an
 * unknown one: a few small writes, no SMTP round trip.
 */
export async function requestPasswordReset(
  db: Db,
  input: unknown,
  clientAddress: string,
  deps: MailDeps,
  now: Date = new Date(),
): Promise<void> {
  const { email } = parseInput(resetRequestSchema, input);
  await enforceRateLimits(
    db,
    "reset",
    [
      { key: `reset:account:${email}`, rule: RATE_LIMITS.resetAccount },
      { key: `reset:address:${clientAddress}`, rule: RATE_LIMITS.resetAddress },
    ],
    now,
  );
  const user = await findUserByEmail(db, email);
  if (!user) return;
  const token = newToken("reset", now);
  await db.transaction(async (tx) => {
    await insertPasswordResetToken(tx, {
      tokenHash: token.hash,
      userId: user.id,
      expiresAt: token.expiresAt,
    });
    await recordAudit(tx, { actorId: user.id, action: "account.reset-request" });
    await queueMail(
      tx,
      resetPasswordMessage({
        to: user.email,
        name: user.name,
        url: linkTo(deps.appUrl, `/reset/${token.token}`),
      }),
      now,
    );
  });
  deps.wakeOutbox?.();
}

/** Checks a reset token without using it (the page shows the error before the form). */
export async function checkResetToken(db: Db, token: unknown, now: Date = new Date()) {
  if (!looksLikeToken(token)) throw new AppError("not-found:token", MESSAGES.unknown, "token");
  const row = await findPasswordResetToken(db, hashToken(token));
  const state = tokenState(row, now);
  if (state === "unknown") throw new AppError("not-found:token", MESSAGES.unknown, "token");
  if (state === "used") throw new AppError("used:token", MESSAGES.used, "token");
  if (state === "expired") throw new AppError("expired:token", MESSAGES.expired, "token");
  return row;
}

/** Sets the new password, uses up every open reset link and ends every session of the user. */
export async function resetPassword(
  db: Db,
  input: unknown,
  now: Date = new Date(),
): Promise<{ userId: string }> {
  const data = parseInput(resetPasswordSchema, input);
  const row = await checkResetToken(db, data.token, now);
  const { hash, salt } = await hashPassword(data.password);
  return db.transaction(async (tx) => {
    const consumed = await consumePasswordResetToken(tx, row.tokenHash, now);
    if (!consumed) throw new AppError("used:token", MESSAGES.used, "token");
    await useUpResetTokensOfUser(tx, row.userId, now);
    // The link reached the mailbox, so the address is proven as well.
    const user = await setUserPasswordReturningVerified(tx, row.userId, { hash, salt });
    if (!user.verifiedAt) await setUserVerifiedAt(tx, row.userId, now);
    await deleteSessionsOfUser(tx, row.userId);
    await revokeApiTokensOfUser(tx, row.userId, now);
    await recordAudit(tx, { actorId: row.userId, action: "account.reset-password" });
    return { userId: row.userId };
  });
}

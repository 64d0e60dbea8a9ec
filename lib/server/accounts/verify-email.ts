import "server-only";

import type { Db } from "@/db/client";
import {
  consumeEmailVerificationToken,
  findEmailVerificationToken,
  insertEmailVerificationToken,
} from "@/db/queries/account-tokens";
import { verifyUserIfUnverified } from "@/db/queries/accounts";
import { recordAudit } from "@/lib/server/access/audit";
import { hashToken, looksLikeToken, newToken, tokenState } from "@/lib/server/accounts/auth/tokens";
import { verifyEmailMessage } from "@/lib/server/email/templates/verify";
import { linkTo, type MailDeps } from "@/lib/shared/mail-types";
import { AppError } from "@/lib/shared/errors";
import { enforceRateLimits } from "@/lib/server/access/rate-limit";

import type { SignedInActor } from "./actor";

const MESSAGES = {
  unknown: "This confirmation link is not valid. Ask for a new one from your account page.",
  used: "This confirmation link was used already. If your address is confirmed, just sign in.",
  expired:
    "This confirmation link has expired. Sign in and ask for a new one from your account page.",
};

export async function verifyEmail(
  db: Db,
  token: unknown,
  now: Date = new Date(),
): Promise<{ userId: string }> {
  if (!looksLikeToken(token)) throw new AppError("not-found:token", MESSAGES.unknown);
  const row = await findEmailVerificationToken(db, hashToken(token));
  const state = tokenState(row, now);
  if (state === "unknown") throw new AppError("not-found:token", MESSAGES.unknown);
  if (state === "used") throw new AppError("used:token", MESSAGES.used);
  if (state === "expired") throw new AppError("expired:token", MESSAGES.expired);

  return db.transaction(async (tx) => {
    // The usedAt IS NULL condition makes a double click (two requests) consume it once.
    const consumed = await consumeEmailVerificationToken(tx, row.tokenHash, now);
    if (!consumed) throw new AppError("used:token", MESSAGES.used);
    await verifyUserIfUnverified(tx, row.userId, now);
    await recordAudit(tx, { actorId: row.userId, action: "account.verify" });
    return { userId: row.userId };
  });
}

export async function resendVerification(
  db: Db,
  actor: SignedInActor,
  deps: MailDeps,
): Promise<void> {
  if (actor.verified)
    throw new AppError("conflict:verified", "Your e-mail address is confirmed already.");
  await enforceRateLimits(db, "verify", [
    { key: `verify:account:${actor.id}`, rule: { limit: 5, windowMs: 60 * 60 * 1000 } },
  ]);
  const token = newToken("verification");
  await insertEmailVerificationToken(db, {
    tokenHash: token.hash,
    userId: actor.id,
    expiresAt: token.expiresAt,
  });
  await deps.mailer.send(
    verifyEmailMessage({
      to: actor.email,
      name: actor.name,
      url: linkTo(deps.appUrl, `/verify/${token.token}`),
    }),
  );
}

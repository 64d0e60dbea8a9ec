import "server-only";

import type { Db } from "@/db/client";
import { insertEmailVerificationToken } from "@/db/queries/account-tokens";
import { findUserRefByEmail, insertUserIfNewEmail } from "@/db/queries/accounts";
import { recordAudit } from "@/lib/server/access/audit";
import { enforceRateLimits, RATE_LIMITS } from "@/lib/server/access/rate-limit";
import { hashPassword } from "@/lib/server/accounts/auth/password";
import { newToken } from "@/lib/server/accounts/auth/tokens";
import { queueMail } from "@/lib/server/email/mail-outbox";
import { signUpAttemptMessage } from "@/lib/server/email/templates/sign-up-attempt";
import { verifyEmailMessage } from "@/lib/server/email/templates/verify";
import { linkTo, type MailDeps } from "@/lib/shared/mail-types";
import { signUpSchema } from "@/lib/shared/validations/auth";
import { parseInput } from "@/lib/shared/validations/parse";

import { isUniqueViolation } from "./pg-errors";

/**
 * Creates an unverified account and queues the confirmation link. Does not sign in.
 *
 * The answer is the same whether the address has an account already: the form must not tell
 * anyone who is registered. The owner of a known address gets a mail saying someone tried,
 * and the work is alike both ways (the password is hashed, one mail is queued, never sent
 * inline), so the time of the answer tells nothing either. `userId` is for callers inside the
 * server only (null when the address was known); the page shows the same notice either way.
 */
export async function signUp(
  db: Db,
  input: unknown,
  clientAddress: string,
  deps: MailDeps,
  now: Date = new Date(),
): Promise<{ userId: string | null }> {
  const data = parseInput(signUpSchema, input);
  await enforceRateLimits(
    db,
    "sign-up",
    [
      { key: `sign-up:account:${data.email}`, rule: RATE_LIMITS.signUpAccount },
      { key: `sign-up:address:${clientAddress}`, rule: RATE_LIMITS.signUpAddress },
    ],
    now,
  );
  const { hash, salt } = await hashPassword(data.password);
  const token = newToken("verification", now);
  let userId: string | null;
  try {
    userId = await db.transaction(async (tx) => {
      const user = await insertUserIfNewEmail(tx, {
        email: data.email,
        name: data.name,
        passwordHash: hash,
        passwordSalt: salt,
      });
      if (!user) return null;
      await insertEmailVerificationToken(tx, {
        tokenHash: token.hash,
        userId: user.id,
        expiresAt: token.expiresAt,
      });
      await recordAudit(tx, { actorId: user.id, action: "account.sign-up", target: data.email });
      await queueMail(
        tx,
        verifyEmailMessage({
          to: data.email,
          name: data.name,
          url: linkTo(deps.appUrl, `/verify/${token.token}`),
        }),
        now,
      );
      return user.id;
    });
  } catch (error) {
    // A race the conflict clause did not absorb: treat it as the known-address case.
    if (!isUniqueViolation(error)) throw error;
    userId = null;
  }
  if (userId === null) await tellOwnerOfAttempt(db, data.email, deps, now);
  deps.wakeOutbox?.();
  return { userId };
}

async function tellOwnerOfAttempt(db: Db, email: string, deps: MailDeps, now: Date) {
  const owner = await findUserRefByEmail(db, email);
  if (!owner) return;
  await recordAudit(db, { actorId: owner.id, action: "account.sign-up-again", target: email });
  await queueMail(
    db,
    signUpAttemptMessage({
      to: email,
      name: owner.name,
      signInUrl: linkTo(deps.appUrl, "/sign-in"),
      resetUrl: linkTo(deps.appUrl, "/reset"),
    }),
    now,
  );
}

import "server-only";

import { eq } from "drizzle-orm";

import type { Db } from "@/db/client";
import { emailVerificationTokens, users } from "@/db/schema/users";
import { recordAudit } from "@/lib/server/access/audit";
import { hashPassword } from "@/lib/server/accounts/auth/password";
import { newToken } from "@/lib/server/accounts/auth/tokens";
import { verifyEmailMessage } from "@/lib/server/email/templates/verify";
import { linkTo, type MailDeps } from "@/lib/shared/mail-types";
import { AppError } from "@/lib/shared/errors";
import { signUpSchema } from "@/lib/shared/validations/auth";
import { parseInput } from "@/lib/shared/validations/parse";

import { isUniqueViolation } from "./pg-errors";

const DUPLICATE =
  "An account with this e-mail address exists already. Sign in, or reset the password.";

/** Creates an unverified account and mails the confirmation link. Does not sign in. */
export async function signUp(db: Db, input: unknown, deps: MailDeps): Promise<{ userId: string }> {
  const data = parseInput(signUpSchema, input);
  const [existing] = await db
    .select({ id: users.id })
    .from(users)
    .where(eq(users.email, data.email));
  if (existing) throw new AppError("conflict:email", DUPLICATE, "email");

  const { hash, salt } = await hashPassword(data.password);
  const token = newToken("verification");
  let userId: string;
  try {
    userId = await db.transaction(async (tx) => {
      const [user] = await tx
        .insert(users)
        .values({ email: data.email, name: data.name, passwordHash: hash, passwordSalt: salt })
        .returning({ id: users.id });
      await tx
        .insert(emailVerificationTokens)
        .values({ tokenHash: token.hash, userId: user.id, expiresAt: token.expiresAt });
      await recordAudit(tx, { actorId: user.id, action: "account.sign-up", target: data.email });
      return user.id;
    });
  } catch (error) {
    // Two sign-ups racing for one address: the unique index decides, same message.
    if (isUniqueViolation(error)) throw new AppError("conflict:email", DUPLICATE, "email");
    throw error;
  }
  // After commit: a mail failure leaves a valid account whose owner can ask for a new link.
  await deps.mailer.send(
    verifyEmailMessage({
      to: data.email,
      name: data.name,
      url: linkTo(deps.appUrl, `/verify/${token.token}`),
    }),
  );
  return { userId };
}

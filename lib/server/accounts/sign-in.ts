import "server-only";

import type { Db } from "@/db/client";
import { findUserByEmail, setUserPassword } from "@/db/queries/accounts";
import type { User } from "@/db/schema/users";
import {
  burnPasswordCheck,
  hashPassword,
  needsRehash,
  verifyPassword,
} from "@/lib/server/accounts/auth/password";
import { AppError } from "@/lib/shared/errors";
import { enforceRateLimits, RATE_LIMITS } from "@/lib/server/access/rate-limit";
import { signInSchema } from "@/lib/shared/validations/auth";
import { parseInput } from "@/lib/shared/validations/parse";

const WRONG = "That e-mail and password do not match an account.";

/**
 * Checks credentials under the per-account and per-address limits. Returns the user; the caller
 * (a server action) opens the session. Unverified users may sign in: they can only use their
 * account page and the sandbox until they confirm (teams require a confirmed address).
 */
export async function authenticate(
  db: Db,
  input: unknown,
  clientAddress: string,
  now: Date = new Date(),
): Promise<User> {
  const data = parseInput(signInSchema, input);
  await enforceRateLimits(
    db,
    "sign-in",
    [
      { key: `sign-in:account:${data.email}`, rule: RATE_LIMITS.signInAccount },
      { key: `sign-in:address:${clientAddress}`, rule: RATE_LIMITS.signInAddress },
    ],
    now,
  );
  const user = await findUserByEmail(db, data.email);
  if (!user) {
    await burnPasswordCheck(data.password);
    throw new AppError("invalid:credentials", WRONG, "password");
  }
  const stored = { hash: user.passwordHash, salt: user.passwordSalt };
  const ok = await verifyPassword(data.password, stored);
  if (!ok) throw new AppError("invalid:credentials", WRONG, "password");
  if (needsRehash(stored)) {
    // The only moment the plain password is at hand: bring an old record up to today's cost.
    const fresh = await hashPassword(data.password);
    await setUserPassword(db, user.id, fresh);
    return { ...user, passwordHash: fresh.hash, passwordSalt: fresh.salt };
  }
  return user;
}

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
import {
  clearSignInFailures,
  countSignInFailure,
  signInCounters,
  sleepFor,
  throttleSignIn,
  type Sleeper,
} from "@/lib/server/accounts/sign-in-throttle";
import { signInSchema } from "@/lib/shared/validations/auth";
import { parseInput } from "@/lib/shared/validations/parse";

const WRONG = "That e-mail and password do not match an account.";

/**
 * Checks credentials under the sign-in throttle: only failures count, the account's counter is
 * kept per account and client address, and past a soft limit the answer waits (`sleep`) rather
 * than refuses. Returns the user; the caller (a server action) opens the session. Unverified
 * users may sign in: they can only use their account page and the sandbox until they confirm
 * (teams require a confirmed address).
 */
export async function authenticate(
  db: Db,
  input: unknown,
  clientAddress: string,
  now: Date = new Date(),
  sleep: Sleeper = sleepFor,
): Promise<User> {
  const data = parseInput(signInSchema, input);
  const counters = signInCounters(data.email, clientAddress);
  const both = [counters.accountAddress, counters.address];
  await throttleSignIn(db, both, now, sleep);
  const user = await findUserByEmail(db, data.email);
  if (!user) {
    await burnPasswordCheck(data.password);
    await countSignInFailure(db, both, now);
    throw new AppError("invalid:credentials", WRONG, "password");
  }
  const stored = { hash: user.passwordHash, salt: user.passwordSalt };
  const ok = await verifyPassword(data.password, stored);
  if (!ok) {
    await countSignInFailure(db, both, now);
    throw new AppError("invalid:credentials", WRONG, "password");
  }
  await clearSignInFailures(db, counters.accountAddress);
  if (needsRehash(stored)) {
    // The only moment the plain password is at hand: bring an old record up to today's cost.
    const fresh = await hashPassword(data.password);
    await setUserPassword(db, user.id, fresh);
    return { ...user, passwordHash: fresh.hash, passwordSalt: fresh.salt };
  }
  return user;
}

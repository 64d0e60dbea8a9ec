import { and, eq, isNull } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { sessions } from "@/db/schema/sessions";
import { users, type User } from "@/db/schema/users";

// Account rows (users and their sessions). Addresses arrive normalized by the input schemas;
// the services hold the rules (limits, same answer for known and unknown addresses).

export async function findUserByEmail(db: Executor, email: string): Promise<User | undefined> {
  const [user] = await db.select().from(users).where(eq(users.email, email));
  return user;
}

/** Only the id and name of the account under an address, for a notice to its owner. */
export async function findUserRefByEmail(db: Executor, email: string) {
  const [owner] = await db
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(eq(users.email, email));
  return owner;
}

/** Inserts an account unless the address has one; undefined in that case. */
export async function insertUserIfNewEmail(
  db: Executor,
  values: { email: string; name: string; passwordHash: string; passwordSalt: string },
): Promise<{ id: string } | undefined> {
  const [user] = await db
    .insert(users)
    .values(values)
    .onConflictDoNothing({ target: users.email })
    .returning({ id: users.id });
  return user;
}

export async function setUserPassword(
  db: Executor,
  userId: string,
  password: { hash: string; salt: string },
): Promise<void> {
  await db
    .update(users)
    .set({ passwordHash: password.hash, passwordSalt: password.salt })
    .where(eq(users.id, userId));
}

/** Sets the password and says when the address was confirmed (null: not yet). */
export async function setUserPasswordReturningVerified(
  db: Executor,
  userId: string,
  password: { hash: string; salt: string },
) {
  const [user] = await db
    .update(users)
    .set({ passwordHash: password.hash, passwordSalt: password.salt })
    .where(eq(users.id, userId))
    .returning({ verifiedAt: users.verifiedAt });
  return user;
}

export async function setUserVerifiedAt(db: Executor, userId: string, at: Date): Promise<void> {
  await db.update(users).set({ verifiedAt: at }).where(eq(users.id, userId));
}

/** Marks the address confirmed unless it is already (the first confirmation date stays). */
export async function verifyUserIfUnverified(
  db: Executor,
  userId: string,
  at: Date,
): Promise<void> {
  await db
    .update(users)
    .set({ verifiedAt: at })
    .where(and(eq(users.id, userId), isNull(users.verifiedAt)));
}

export async function deleteSessionsOfUser(db: Executor, userId: string): Promise<void> {
  await db.delete(sessions).where(eq(sessions.userId, userId));
}

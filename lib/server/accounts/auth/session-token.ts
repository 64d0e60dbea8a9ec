import { createHash, randomBytes } from "node:crypto";

import type { AppLucia } from "./lucia";

// Sessions (free of Next imports: scripts and tests make sessions the same way).
//
// The cookie carries a 32-byte random secret; the sessions table keeps only its SHA-256 as the
// session id (lucia v3 accepts a chosen id). Reading the table, a backup or a log of it gives no
// working cookie. A session slides while in use (lucia's expires_at, SESSION_IDLE_DAYS) but ends
// SESSION_ABSOLUTE_DAYS after sign-in whatever the activity, so a stolen cookie kept busy still
// dies.

export const SESSION_IDLE_DAYS = 14;
export const SESSION_ABSOLUTE_DAYS = 30;
const ABSOLUTE_MS = SESSION_ABSOLUTE_DAYS * 24 * 60 * 60 * 1000;

export function sessionIdOf(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/** A new session: the token goes into the cookie, only its hash into the table. */
export async function createSessionToken(lucia: AppLucia, userId: string, now = new Date()) {
  const token = randomBytes(32).toString("base64url");
  const session = await lucia.createSession(
    userId,
    { signedInAt: now },
    { sessionId: sessionIdOf(token) },
  );
  return { token, session };
}

/** The session a cookie's token names, or none when unknown, idle too long or too old. */
export async function validateSessionToken(lucia: AppLucia, token: string, now = new Date()) {
  const result = await lucia.validateSession(sessionIdOf(token));
  if (result.session && now.getTime() - result.session.signedInAt.getTime() >= ABSOLUTE_MS) {
    await lucia.invalidateSession(result.session.id);
    return { session: null, user: null } as const;
  }
  return result;
}

import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import { Lucia, TimeSpan } from "lucia";

import type { Db } from "@/db/client";
import { sessions } from "@/db/schema/sessions";
import { users } from "@/db/schema/users";
import type { SignedInActor } from "@/lib/server/accounts/actor";

import { SESSION_IDLE_DAYS } from "./session-token";

// Free of Next imports so tests and scripts can build one on their own handle.
export const SESSION_COOKIE = "craq_session";

export function createLucia(db: Db, options: { secureCookies: boolean }) {
  return new Lucia(new DrizzlePostgreSQLAdapter(db, sessions, users), {
    // Idle limit (slides with use); the absolute limit is checked in session-token.ts.
    sessionExpiresIn: new TimeSpan(SESSION_IDLE_DAYS, "d"),
    sessionCookie: {
      name: SESSION_COOKIE,
      expires: true,
      // lucia sets HttpOnly, SameSite=Lax and Path=/ itself; Secure follows the public URL.
      attributes: { secure: options.secureCookies, sameSite: "lax" },
    },
    // Only these columns leave the database with a session; never the password hash.
    getUserAttributes: (row) => ({ email: row.email, name: row.name, verifiedAt: row.verifiedAt }),
    getSessionAttributes: (row) => ({ signedInAt: row.signedInAt }),
  });
}
export type AppLucia = ReturnType<typeof createLucia>;

declare module "lucia" {
  interface Register {
    Lucia: AppLucia;
    DatabaseUserAttributes: { email: string; name: string; verifiedAt: Date | null };
    DatabaseSessionAttributes: { signedInAt: Date };
  }
}

export function actorFromUser(user: {
  id: string;
  email: string;
  name: string;
  verifiedAt: Date | null;
}): SignedInActor {
  return { id: user.id, email: user.email, name: user.name, verified: user.verifiedAt !== null };
}

import "server-only";

import { cookies } from "next/headers";
import { cache } from "react";

import { getDb } from "@/db/index";
import type { Actor } from "@/lib/server/accounts/actor";
import { isHttpsApp } from "@/lib/server/access/env";

import { actorFromUser, createLucia, SESSION_COOKIE, type AppLucia } from "./lucia";
import { createSessionToken, validateSessionToken } from "./session-token";

let instance: AppLucia | undefined;

function getLucia(): AppLucia {
  instance ??= createLucia(getDb(), { secureCookies: isHttpsApp() });
  return instance;
}

/** Once per request: reads the session cookie and validates (and slides) the session. */
export const getCurrentSession = cache(async () => {
  // cookies() first: it marks the render dynamic, so `next build` never reaches the database.
  const store = await cookies();
  const token = store.get(SESSION_COOKIE)?.value ?? null;
  if (!token) return { user: null, session: null };
  const lucia = getLucia();
  const result = await validateSessionToken(lucia, token);
  // Server Components may not set cookies; actions and route handlers may. Refreshing is a
  // nicety, so a refusal here is ignored and the next action will refresh instead.
  try {
    if (result.session?.fresh) {
      const cookie = lucia.createSessionCookie(token);
      store.set(cookie.name, cookie.value, cookie.attributes);
    }
    if (!result.session) {
      const cookie = lucia.createBlankSessionCookie();
      store.set(cookie.name, cookie.value, cookie.attributes);
    }
  } catch {
    // Rendering a Server Component: cookie writes are not allowed there.
  }
  return result;
});

export async function getActor(): Promise<Actor> {
  const { user } = await getCurrentSession();
  return user ? actorFromUser(user) : null;
}

/** Call from actions only. */
export async function startSession(userId: string): Promise<void> {
  const lucia = getLucia();
  const { token } = await createSessionToken(lucia, userId);
  const cookie = lucia.createSessionCookie(token);
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

/** Call from actions only. */
export async function endSession(): Promise<void> {
  const lucia = getLucia();
  const { session } = await getCurrentSession();
  if (session) await lucia.invalidateSession(session.id);
  const cookie = lucia.createBlankSessionCookie();
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

import "server-only";

import { cookies } from "next/headers";
import { cache } from "react";

import { getDb } from "@/db/index";
import type { Actor } from "@/lib/server/accounts/actor";
import { isHttpsApp } from "@/lib/server/access/env";

import { actorFromUser, createLucia, SESSION_COOKIE, type AppLucia } from "./lucia";

let instance: AppLucia | undefined;

export function getLucia(): AppLucia {
  instance ??= createLucia(getDb(), { secureCookies: isHttpsApp() });
  return instance;
}

/** Once per request: reads the session cookie and validates (and slides) the session. */
export const getCurrentSession = cache(async () => {
  // cookies() first: it marks the render dynamic, so `next build` never reaches the database.
  const store = await cookies();
  const sessionId = store.get(SESSION_COOKIE)?.value ?? null;
  if (!sessionId) return { user: null, session: null };
  const lucia = getLucia();
  const result = await lucia.validateSession(sessionId);
  // Server Components may not set cookies; actions and route handlers may. Refreshing is a
  // nicety, so a refusal here is ignored and the next action will refresh instead.
  try {
    if (result.session?.fresh) {
      const cookie = lucia.createSessionCookie(result.session.id);
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
  const session = await lucia.createSession(userId, {});
  const cookie = lucia.createSessionCookie(session.id);
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

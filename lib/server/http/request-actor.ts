import "server-only";

import { getDb } from "@/db/index";
import type { Actor } from "@/lib/server/accounts/actor";
import { actorFromUser, createLucia, type AppLucia } from "@/lib/server/accounts/auth/lucia";
import { validateSessionToken } from "@/lib/server/accounts/auth/session-token";
import { isHttpsApp } from "@/lib/server/access/env";

import { clientAddressFrom, trustedProxies } from "./client-peer";

let lucia: AppLucia | undefined;

function apiLucia(): AppLucia {
  lucia ??= createLucia(getDb(), { secureCookies: isHttpsApp() });
  return lucia;
}

/**
 * The session of a route handler's request, read from its Cookie header (not next/headers, so
 * handlers can be called with a plain Request in tests). A refreshed or dead session comes
 * back with the Set-Cookie value the response should carry.
 */
export async function actorFromRequest(
  request: Request,
): Promise<{ actor: Actor; setCookie?: string }> {
  const auth = apiLucia();
  const token = auth.readSessionCookie(request.headers.get("cookie") ?? "");
  if (!token) return { actor: null };
  const { session, user } = await validateSessionToken(auth, token);
  if (!session) return { actor: null, setCookie: auth.createBlankSessionCookie().serialize() };
  return {
    actor: actorFromUser(user),
    setCookie: session.fresh ? auth.createSessionCookie(token).serialize() : undefined,
  };
}

/** Per-address key for rate limits (the rule: lib/server/http/client-peer.ts). */
export function clientAddressOf(request: Request): string {
  return clientAddressFrom((name) => request.headers.get(name), trustedProxies());
}

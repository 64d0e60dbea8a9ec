import "server-only";

import type { Db } from "@/db/client";
import { getDb } from "@/db/index";
import type { Actor } from "@/lib/server/accounts/actor";
import type { TokenPrincipal } from "@/lib/server/accounts/api-tokens/authenticate";
import { hitRateLimit, type RateLimitRule } from "@/lib/server/access/rate-limit";
import { AppError } from "@/lib/shared/errors";
import type { Capability } from "@/lib/shared/permissions";

import { refuseCrossOriginWrite } from "./origin-check";
import { actorFromRequest } from "./request-actor";
import { errorResponse, jsonResponse } from "./respond";
import { refuseAnonymousWrite } from "./sign-in-first";
import { tokenPrincipalOf } from "./token-principal";

export interface RouteInput<P> {
  request: Request;
  params: P;
  actor: Actor;
  db: Db;
  /** Query parameters as a plain object (last value wins). */
  query: Record<string, string>;
  /** Set when the request came with a Bearer token (routes that accept one). */
  token: TokenPrincipal | null;
}

/** What a handler returns: plain data (200), `Created` data (201), or a finished Response. */
export class Created<T> {
  constructor(readonly data: T) {}
}

/** Per token (and per signed-in user where a route asks): generous for scripts, a brake for loops. */
export const API_RATE_LIMIT: RateLimitRule = { limit: 120, windowMs: 60 * 1000 };

interface RouteOptions {
  /** Also accept `Authorization: Bearer <personal API token>` whose role holds this capability. */
  tokenCapability?: Capability;
  /** Rate-limit signed-in sessions too (tokens are always limited). */
  limitSessions?: boolean;
}

type Handler<P> = (input: RouteInput<P>) => Promise<unknown>;

function toResponse(result: unknown): Response {
  if (result instanceof Response) return result;
  if (result instanceof Created) return jsonResponse(result.data, 201);
  return jsonResponse(result);
}

async function overLimit(db: Db, key: string | null): Promise<void> {
  if (key === null) return;
  const result = await hitRateLimit(db, key, API_RATE_LIMIT);
  if (result.allowed) return;
  const error = new AppError(
    "rate-limited:api",
    `Too many requests; try again in ${result.retryAfterSeconds} s.`,
  );
  // errorResponse turns this into the Retry-After header.
  throw Object.assign(error, { retryAfterSeconds: result.retryAfterSeconds });
}

/**
 * The one wrapper of every JSON route: refuses a write sent from another site's page (CSRF; the
 * proxy skips /api), resolves who is asking (a Bearer token where the route accepts one, else the
 * session cookie), refuses anonymous writes, applies the rate limit, passes the actor on (the
 * services check the team role themselves), and turns the result into JSON and any error into
 * `{ error: { code, message, path? } }` with the one status of its code. Never a stack trace.
 */
function route<P>(options: RouteOptions, handler: Handler<P>) {
  return async (request: Request, context: { params: Promise<P> }): Promise<Response> => {
    let setCookie: string | undefined;
    let response: Response;
    try {
      refuseCrossOriginWrite(request);
      const db = getDb();
      const params = await context.params;
      const team = (params as { team?: string } | undefined)?.team;
      const token = options.tokenCapability
        ? await tokenPrincipalOf(db, request, team, options.tokenCapability)
        : null;
      let actor: Actor = token?.actor ?? null;
      if (!token) {
        const session = await actorFromRequest(request);
        setCookie = session.setCookie;
        actor = session.actor;
      }
      refuseAnonymousWrite(request, actor);
      await overLimit(
        db,
        token
          ? `api-token:${token.tokenId}`
          : actor && options.limitSessions
            ? `api-user:${actor.id}`
            : null,
      );
      const query = Object.fromEntries(new URL(request.url).searchParams);
      response = toResponse(await handler({ request, params, actor, db, query, token }));
    } catch (error) {
      response = errorResponse(error);
    }
    if (setCookie) response.headers.append("set-cookie", setCookie);
    return response;
  };
}

/** A route for the app's own pages: the session cookie only. */
export function apiRoute<P>(handler: Handler<P>) {
  return route({}, handler);
}

/**
 * A route scripts may call too: with a token, the team in the URL must be the token's team (else
 * 404) and the token's effective role must hold `capability` (else 403); the services then run as
 * the token's owner, whose own role is at least the token's. Without one, as apiRoute.
 */
export function tokenRoute<P>(
  capability: Capability,
  handler: Handler<P>,
  options: { limitSessions?: boolean } = {},
) {
  return route({ tokenCapability: capability, limitSessions: options.limitSessions }, handler);
}

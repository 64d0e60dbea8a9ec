import "server-only";

import type { Db } from "@/db/client";
import { getDb } from "@/db/index";
import type { Actor } from "@/lib/server/accounts/actor";
import {
  authenticateToken,
  type TokenPrincipal,
} from "@/lib/server/accounts/api-tokens/authenticate";
import { bearerOf } from "@/lib/server/accounts/api-tokens/secret";
import { tokenCan } from "@/lib/shared/token-roles";
import type { Capability } from "@/lib/shared/permissions";
import { AppError } from "@/lib/shared/errors";
import { hitRateLimit, type RateLimitRule } from "@/lib/server/access/rate-limit";
import { NOT_FOUND_MESSAGE } from "@/lib/server/access/team-access";

import { refuseCrossOriginWrite } from "./origin-check";
import { actorFromRequest } from "./request-actor";
import { errorResponse, jsonResponse } from "./respond";
import { Created, type RouteInput } from "./route";
import { refuseAnonymousWrite } from "./sign-in-first";

/** Per token (and per signed-in user where a route asks): generous for scripts, a brake for loops. */
export const API_RATE_LIMIT: RateLimitRule = { limit: 120, windowMs: 60 * 1000 };

// The JSON API answers a well-formed request it cannot carry out (a scenario file that does not
// validate, a run over its time budget) with 422, as the public API's document says.
const UNPROCESSABLE = new Set(["invalid:file", "invalid:time-budget", "invalid:csv"]);

export interface TokenRouteInput<P> extends RouteInput<P> {
  /** Set when the request came with a Bearer token. */
  token: TokenPrincipal | null;
}

async function principalOf(
  db: Db,
  request: Request,
  team: string | undefined,
  capability: Capability,
) {
  const bearer = bearerOf(request);
  if (bearer === null) return null;
  const principal = await authenticateToken(db, bearer);
  if (team !== undefined && team !== principal.teamSlug) {
    throw new AppError("not-found:team", NOT_FOUND_MESSAGE);
  }
  if (!tokenCan(principal.role, principal.memberRole, capability)) {
    throw new AppError("forbidden:token", `This token's role (${principal.role}) may not do that.`);
  }
  return principal;
}

async function limit(db: Db, key: string): Promise<number | null> {
  const result = await hitRateLimit(db, key, API_RATE_LIMIT);
  return result.allowed ? null : result.retryAfterSeconds;
}

/**
 * Like apiRoute, and also accepts `Authorization: Bearer <personal API token>`. With a token,
 * the team in the URL must be the token's team (else 404) and the token's effective role must
 * hold `capability` (else 403); the services then run as the token's owner, whose own role is
 * at least the token's. Without one, the session cookie counts as in apiRoute.
 */
export function tokenRoute<P>(
  capability: Capability,
  handler: (input: TokenRouteInput<P>) => Promise<unknown>,
  options: { limitSessions?: boolean } = {},
) {
  return async (request: Request, context: { params: Promise<P> }): Promise<Response> => {
    let setCookie: string | undefined;
    let response: Response;
    try {
      refuseCrossOriginWrite(request);
      const db = getDb();
      const params = await context.params;
      const team = (params as { team?: string } | undefined)?.team;
      const token = await principalOf(db, request, team, capability);
      let actor: Actor = token?.actor ?? null;
      if (!token) {
        const session = await actorFromRequest(request);
        setCookie = session.setCookie;
        actor = session.actor;
      }
      refuseAnonymousWrite(request, actor);
      // Tokens are always limited; the app's own pages (sessions) only where a route asks.
      const key = token
        ? `api-token:${token.tokenId}`
        : actor && options.limitSessions
          ? `api-user:${actor.id}`
          : null;
      const wait = key ? await limit(db, key) : null;
      if (wait !== null) {
        response = errorResponse(
          new AppError("rate-limited:api", `Too many requests; try again in ${wait} s.`),
        );
        response.headers.set("retry-after", String(wait));
      } else {
        const query = Object.fromEntries(new URL(request.url).searchParams);
        const result = await handler({ request, params, actor, db, query, token });
        response =
          result instanceof Response
            ? result
            : result instanceof Created
              ? jsonResponse(result.data, 201)
              : jsonResponse(result);
      }
    } catch (error) {
      response = errorResponse(error);
      const code = (error as AppError).code;
      if (error instanceof AppError && UNPROCESSABLE.has(code)) {
        response = new Response(response.body, { status: 422, headers: response.headers });
      }
    }
    if (setCookie) response.headers.append("set-cookie", setCookie);
    return response;
  };
}

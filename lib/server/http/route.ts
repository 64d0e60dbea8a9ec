import "server-only";

import type { Db } from "@/db/client";
import { getDb } from "@/db/index";
import type { Actor } from "@/lib/server/accounts/actor";

import { refuseCrossOriginWrite } from "./origin-check";
import { actorFromRequest } from "./request-actor";
import { errorResponse, jsonResponse } from "./respond";
import { refuseAnonymousWrite } from "./sign-in-first";

export interface RouteInput<P> {
  request: Request;
  params: P;
  actor: Actor;
  db: Db;
  /** Query parameters as a plain object (last value wins). */
  query: Record<string, string>;
}

/** What a handler returns: plain data (200), `Created` data (201), or a finished Response. */
export class Created<T> {
  constructor(readonly data: T) {}
}

/**
 * Wraps a route handler: refuses a write sent from another site's page (CSRF; the proxy skips
 * /api), resolves the session from the request's cookie, passes the actor on
 * (the services check the team role themselves), turns the result into JSON and any error
 * into `{ error: { code, message, path? } }` with its status. Never a stack trace.
 */
export function apiRoute<P>(handler: (input: RouteInput<P>) => Promise<unknown>) {
  return async (request: Request, context: { params: Promise<P> }): Promise<Response> => {
    let setCookie: string | undefined;
    let response: Response;
    try {
      refuseCrossOriginWrite(request);
      const db = getDb();
      const session = await actorFromRequest(request);
      setCookie = session.setCookie;
      refuseAnonymousWrite(request, session.actor);
      const params = await context.params;
      const query = Object.fromEntries(new URL(request.url).searchParams);
      const result = await handler({ request, params, actor: session.actor, db, query });
      if (result instanceof Response) response = result;
      else if (result instanceof Created) response = jsonResponse(result.data, 201);
      else response = jsonResponse(result);
    } catch (error) {
      response = errorResponse(error);
    }
    if (setCookie) response.headers.append("set-cookie", setCookie);
    return response;
  };
}

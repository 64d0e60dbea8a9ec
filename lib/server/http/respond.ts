import "server-only";

import {
  BAD_TEXT_MESSAGE,
  classifyDbError,
  DB_UNAVAILABLE_MESSAGE,
} from "@/lib/server/http/db-errors";
import { isAppError, MASKED_MESSAGE } from "@/lib/shared/errors";
import { DetailedAppError } from "@/lib/server/workspace/errors";

/** The one error shape of the JSON API. */
export interface ApiErrorBody {
  error: { code: string; message: string; path?: string; [detail: string]: unknown };
}

// One status per code, whichever route answers. A well-formed request the server cannot carry
// out (a scenario file or CSV that does not validate, a run over its time budget) is 422, as the
// public API's document says; other bad input is 400.
const STATUS_BY_PREFIX: [string, number][] = [
  ["unauthenticated", 401],
  ["unverified", 403],
  ["invalid:too-large", 413],
  ["invalid:file", 422],
  ["invalid:csv", 422],
  ["invalid:time-budget", 422],
  ["invalid:", 400],
  ["forbidden:", 403],
  ["not-found:", 404],
  ["conflict:", 409],
  ["expired:", 410],
  ["used:", 410],
  ["rate-limited:", 429],
  ["unavailable:", 503],
];

export function statusOf(code: string): number {
  return STATUS_BY_PREFIX.find(([prefix]) => code.startsWith(prefix))?.[1] ?? 400;
}

const NO_STORE = { "cache-control": "no-store" };

export function jsonResponse(data: unknown, status = 200): Response {
  return Response.json(data, { status, headers: NO_STORE });
}

/** Expected errors keep their code and message; anything else is logged and masked. */
export function errorResponse(error: unknown): Response {
  if (isAppError(error)) {
    const body: ApiErrorBody = { error: { code: error.code, message: error.message } };
    if (error.field) body.error.path = error.field;
    if (error instanceof DetailedAppError) Object.assign(body.error, error.details);
    const response = jsonResponse(body, statusOf(error.code));
    // A full compute pool (and any other "come back later") says when to come back.
    const wait = (error as { retryAfterSeconds?: unknown }).retryAfterSeconds;
    if (typeof wait === "number") response.headers.set("retry-after", String(wait));
    return response;
  }
  const db = classifyDbError(error);
  if (db?.kind === "unavailable") {
    // An outage, not a bug: one line in the log, and the client is told when to come back.
    console.error("[api] database unavailable:", (error as Error)?.message);
    const response = jsonResponse(
      { error: { code: "unavailable:database", message: DB_UNAVAILABLE_MESSAGE } },
      503,
    );
    response.headers.set("retry-after", String(db.retryAfterSeconds));
    return response;
  }
  if (db?.kind === "bad-text") {
    return jsonResponse(
      {
        error: {
          code: "invalid:text",
          message: BAD_TEXT_MESSAGE,
        },
      },
      400,
    );
  }
  console.error("[api unexpected]", error);
  return jsonResponse({ error: { code: "internal", message: MASKED_MESSAGE } }, 500);
}

import {
  BAD_TEXT_MESSAGE,
  classifyDbError,
  DB_UNAVAILABLE_MESSAGE,
} from "../server/http/db-errors";

// Two kinds of failure. An AppError is expected (bad input, not allowed, expired link): it
// carries a stable code like "forbidden:team" and a message written for the user, optionally
// tied to one form field. Anything else is a bug or an outage: logged in full, shown masked.

export type ErrorCode =
  | `invalid:${string}`
  | `forbidden:${string}`
  | `not-found:${string}`
  | `conflict:${string}`
  | `expired:${string}`
  | `used:${string}`
  | `rate-limited:${string}`
  | `unavailable:${string}`
  | "unauthenticated"
  | "unverified";

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = "AppError";
  }
}

export function isAppError(error: unknown): error is AppError {
  return error instanceof AppError;
}

/** What a server action hands back to a form: never a stack, never a raw driver message. */
export type ActionResult<T = void> =
  { ok: true; data: T } | { ok: false; code: string; message: string; field?: string };

export const MASKED_MESSAGE = "Something went wrong on our side. Please try again in a moment.";

function toActionError(error: unknown): Extract<ActionResult, { ok: false }> {
  if (isAppError(error)) {
    return { ok: false, code: error.code, message: error.message, field: error.field };
  }
  // An outage is not a bug: say so plainly, so the person waits instead of retyping.
  const db = classifyDbError(error);
  if (db?.kind === "unavailable") {
    console.error("[action] database unavailable:", (error as Error)?.message);
    return { ok: false, code: "unavailable:database", message: DB_UNAVAILABLE_MESSAGE };
  }
  // A NUL byte PostgreSQL refuses is the person's input, not our fault: the API's answer.
  if (db?.kind === "bad-text")
    return { ok: false, code: "invalid:text", message: BAD_TEXT_MESSAGE };
  // Unexpected: keep the details in the server log only.
  console.error("[unexpected]", error);
  return { ok: false, code: "internal", message: MASKED_MESSAGE };
}

/** Next's redirect()/notFound() work by throwing; those must pass through untouched. */
function isNextControlFlow(error: unknown): boolean {
  const digest = (error as { digest?: unknown } | null)?.digest;
  return (
    typeof digest === "string" && /^NEXT_(REDIRECT|NOT_FOUND|HTTP_ERROR_FALLBACK)/.test(digest)
  );
}

export async function runAction<T>(fn: () => Promise<T>): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await fn() };
  } catch (error) {
    if (isNextControlFlow(error)) throw error;
    return toActionError(error);
  }
}

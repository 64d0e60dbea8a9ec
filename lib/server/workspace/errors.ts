import { AppError, type ErrorCode } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/uuid";

/**
 * An expected error that carries data the client needs to act on it (who saved the newer
 * revision, which fields clash). The API layer puts `details` beside code and message.
 */
export class DetailedAppError extends AppError {
  constructor(
    code: ErrorCode,
    message: string,
    readonly details: Record<string, unknown>,
    field?: string,
  ) {
    super(code, message, field);
  }
}

export function notFound(what: string): AppError {
  return new AppError(
    `not-found:${what}`,
    `There is no such ${what.replace(/-/g, " ")} in this team.`,
  );
}

/** Ids arrive in URLs: anything that is not a UUID is simply not found (never a driver error). */
export function requireUuid(value: unknown, what: string): string {
  if (!isUuid(value)) throw notFound(what);
  return value.toLowerCase();
}

/** Revision numbers arrive in URLs and query strings as text. */
export function requireRevisionNumber(value: unknown): number {
  const text = typeof value === "number" ? String(value) : value;
  if (typeof text !== "string" || !/^[1-9][0-9]{0,8}$/.test(text)) throw notFound("revision");
  return Number(text);
}

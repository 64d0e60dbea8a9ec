// Database failures that are not bugs: the server is unreachable (an outage, answered 503 with
// a hint when to retry), or it refused a value no validation could foresee (a NUL byte in a
// text, which PostgreSQL cannot store: the client's fault, answered 400). Pure, no driver import:
// errors are recognised by the codes postgres.js and Node put on them, also when wrapped
// (Drizzle wraps the driver's error as `cause`).

export type DbFailure = { kind: "unavailable"; retryAfterSeconds: number } | { kind: "bad-text" };

export const DB_RETRY_AFTER_SECONDS = 5;

/** What the API and the server actions both say when PostgreSQL refuses a NUL byte in text. */
export const BAD_TEXT_MESSAGE =
  "The request contains a character that cannot be stored (a NUL byte).";

export const DB_UNAVAILABLE_MESSAGE =
  "The database is not reachable at the moment. Please try again in a few seconds.";

// Node socket errors and postgres.js's own connection codes.
const CONNECTION_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "EPIPE",
  "ETIMEDOUT",
  "EHOSTUNREACH",
  "ENOTFOUND",
  "CONNECTION_CLOSED",
  "CONNECTION_ENDED",
  "CONNECTION_DESTROYED",
  "CONNECT_TIMEOUT",
]);

// SQLSTATE classes 08 (connection exception) and 57P0x (server shutting down or starting up),
// 53300 (too many connections).
function isUnavailableSqlState(code: string): boolean {
  return code.startsWith("08") || /^57P0[1-3]$/.test(code) || code === "53300";
}

// 22021: invalid byte sequence (NUL); 22P05: untranslatable character.
const BAD_TEXT_STATES = new Set(["22021", "22P05"]);

function causes(error: unknown): { code?: unknown; errors?: unknown }[] {
  const chain: { code?: unknown; errors?: unknown }[] = [];
  let current = error;
  for (let depth = 0; depth < 5 && current && typeof current === "object"; depth++) {
    chain.push(current as { code?: unknown });
    current = (current as { cause?: unknown }).cause;
  }
  return chain;
}

export function classifyDbError(error: unknown): DbFailure | null {
  for (const link of causes(error)) {
    const code = typeof link.code === "string" ? link.code : "";
    // Node reports a refused connection to several addresses as an AggregateError.
    const inner = Array.isArray(link.errors) ? link.errors : [];
    const innerCodes = inner.map((e) => (e as { code?: unknown })?.code);
    if (CONNECTION_CODES.has(code) || innerCodes.some((c) => CONNECTION_CODES.has(String(c)))) {
      return { kind: "unavailable", retryAfterSeconds: DB_RETRY_AFTER_SECONDS };
    }
    if (/^[0-9A-Z]{5}$/.test(code)) {
      if (isUnavailableSqlState(code)) {
        return { kind: "unavailable", retryAfterSeconds: DB_RETRY_AFTER_SECONDS };
      }
      if (BAD_TEXT_STATES.has(code)) return { kind: "bad-text" };
    }
  }
  return null;
}

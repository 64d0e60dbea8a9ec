// postgres.js errors carry the SQLSTATE in `code`; drizzle may wrap them in `cause`.
export function isUniqueViolation(error: unknown): boolean {
  for (let e = error as { code?: unknown; cause?: unknown } | undefined; e;) {
    if (e.code === "23505") return true;
    e = e.cause as typeof e;
  }
  return false;
}

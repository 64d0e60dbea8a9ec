/**
 * The one test of "is this an id we could have issued": ids arrive in URLs and bodies, and
 * anything that is not a UUID is simply not found (never a driver error from PostgreSQL).
 */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function isUuid(value: unknown): value is string {
  return typeof value === "string" && UUID.test(value);
}

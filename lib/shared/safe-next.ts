// A "next" parameter comes from the URL: only same-site paths, never "//host" or a full URL.
// Browsers drop tab/newline/NUL while parsing, so "/\t/evil.example" would become "//evil.example":
// refuse control characters and backslashes outright, then resolve against a fixed origin and
// accept only if the origin did not change.
const PROBE_ORIGIN = "http://same-origin.invalid";

export function safeNextPath(value: unknown, fallback = "/teams"): string {
  if (typeof value !== "string" || value.length > 500 || !value.startsWith("/")) return fallback;
  if (/[\u0000-\u001f\u007f\\]/.test(value)) return fallback;
  let resolved: URL;
  try {
    resolved = new URL(value, PROBE_ORIGIN);
  } catch {
    return fallback;
  }
  if (resolved.origin !== PROBE_ORIGIN) return fallback;
  return resolved.pathname + resolved.search + resolved.hash;
}

// A "next" parameter comes from the URL: only same-site paths, never "//host" or a full URL.
export function safeNextPath(value: unknown, fallback = "/teams"): string {
  if (typeof value !== "string" || !value.startsWith("/") || value.startsWith("//"))
    return fallback;
  if (value.includes("\\") || value.length > 500) return fallback;
  return value;
}

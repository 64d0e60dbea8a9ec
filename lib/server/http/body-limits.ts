// No `server-only` here: next.config.ts reads the largest limit to size the proxy's body copy.

export const BODY_LIMITS = {
  /** Small forms: names, comments, verdicts. */
  small: 64 * 1024,
  /** A scenario file with its path (long generated cycle paths stay well below this). */
  scenario: 4 * 1024 * 1024,
  /** A curve file of up to 10 MB travelling as JSON text (escaping can double it). */
  upload: 20 * 1024 * 1024,
  /** A whole team export. */
  teamImport: 64 * 1024 * 1024,
} as const;

/** Server actions (sign-in, team settings, members): small forms; Next's default, stated. */
export const ACTION_BODY_LIMIT = 1024 * 1024;

/**
 * Next copies a request body for the proxy (proxy.ts) and hands the action only the first
 * `proxyClientMaxBodySize` bytes. The proxy skips /api (whose routes read their own bodies up to
 * BODY_LIMITS), so its copy only needs to reach one byte past the actions' limit: a larger body
 * is then refused as too large instead of being parsed cut off.
 */
export const PROXY_BODY_LIMIT = ACTION_BODY_LIMIT + 1;

/** "20 MB", "64 KB": the size as a person reads it. */
export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${Math.round((bytes / 1024 / 1024) * 10) / 10} MB`;
  if (bytes >= 1024) return `${Math.round((bytes / 1024) * 10) / 10} KB`;
  return `${bytes} bytes`;
}

/**
 * Why a team export of `size` bytes could not be imported again, or null when it could: the
 * import route reads at most BODY_LIMITS.teamImport, and test records' original files weigh most.
 */
export function exportTooLargeMessage(
  size: number,
  limit: number = BODY_LIMITS.teamImport,
): string | null {
  if (size <= limit) return null;
  return `The team export would be ${formatBytes(size)}, and an import takes at most ${formatBytes(limit)}, so it could not be imported again. Delete test records that are no longer needed (their original files weigh most) and export again.`;
}

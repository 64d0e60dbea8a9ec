// CSRF defence for every non-GET request, decided from headers alone (no database, no session).

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

export interface RequestHeadersView {
  method: string;
  host: string | null;
  origin: string | null;
  referer: string | null;
}

function hostOf(url: string): string | null {
  try {
    return new URL(url).host;
  } catch {
    return null;
  }
}

/**
 * True when the request must be refused: a state-changing method whose Origin (or, lacking
 * that, Referer) names a different host than the Host header. Browsers always send one of the
 * two on cross-site form posts and fetches; a request with neither is not a browser acting on
 * another site's behalf (scripts, health checks), so it passes. "Origin: null" is refused.
 */
export function isCrossOriginWrite(req: RequestHeadersView): boolean {
  if (SAFE_METHODS.has(req.method.toUpperCase())) return false;
  if (!req.host) return true;
  const source = req.origin ?? req.referer;
  if (source === null) return false;
  return hostOf(source) !== req.host.toLowerCase();
}

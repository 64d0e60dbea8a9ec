// CSRF defence for every non-GET request, decided from headers alone (no database, no session).
// Pages and server actions get it in proxy.ts; /api routes in their wrappers (route.ts,
// tokenRoute), because the proxy would first buffer the whole request body.

import { AppError } from "@/lib/shared/errors";

export const CROSS_ORIGIN_MESSAGE = "Cross-origin request refused.";

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

/** The API wrappers' form of the check: throws the 403 the error responder turns into JSON. */
export function refuseCrossOriginWrite(request: Request): void {
  const refuse = isCrossOriginWrite({
    method: request.method,
    // A request built in code (tests, the server's own calls) may carry no Host header; its URL
    // names the host then, as Next builds request.url from Host for real requests.
    host: request.headers.get("host") ?? hostOf(request.url),
    origin: request.headers.get("origin"),
    referer: request.headers.get("referer"),
  });
  if (refuse) throw new AppError("forbidden:origin", CROSS_ORIGIN_MESSAGE);
}

import { NextResponse, type NextRequest } from "next/server";

import { isCrossOriginWrite } from "@/lib/server/http/origin-check";
import { newNonce, securityHeaders } from "@/lib/server/http/security-headers";

// Next 16's middleware file. Two jobs, both from headers alone (no database work here):
// refuse state-changing requests from other origins, and attach the security headers with a
// per-request script nonce. Sessions and team access are checked where the data is read.
// It does not run for /api: Next copies every request body the proxy sees into memory first, so
// a stranger could make it hold up to the largest upload limit before any route answered 401.
// The API wrappers refuse cross-origin writes themselves; next.config.ts sets their headers.
export function proxy(request: NextRequest) {
  const refuse = isCrossOriginWrite({
    method: request.method,
    host: request.headers.get("host"),
    origin: request.headers.get("origin"),
    referer: request.headers.get("referer"),
  });
  const headers = securityHeaders({
    nonce: newNonce(),
    dev: process.env.NODE_ENV === "development",
  });
  if (refuse) {
    return new NextResponse("Cross-origin request refused.", {
      status: 403,
      headers: { "content-type": "text/plain; charset=utf-8", ...headers },
    });
  }
  // Next reads the policy from the request to find the nonce for the scripts it renders.
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("content-security-policy", headers["content-security-policy"]);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  for (const [name, value] of Object.entries(headers)) response.headers.set(name, value);
  return response;
}

export const config = {
  // Static assets never change state and run no inline script; the API has its own guards.
  matcher: ["/((?!api/|_next/static|_next/image|favicon.ico|icon.svg|fonts/).*)"],
};

import { NextResponse, type NextRequest } from "next/server";

import { isCrossOriginWrite } from "@/lib/origin-check";

// Next 16's middleware file. Its only job: refuse state-changing requests from other origins.
// Sessions and team access are checked where the data is read (pages, actions, routes).
export function proxy(request: NextRequest) {
  const refuse = isCrossOriginWrite({
    method: request.method,
    host: request.headers.get("host"),
    origin: request.headers.get("origin"),
    referer: request.headers.get("referer"),
  });
  if (refuse) {
    return new NextResponse("Cross-origin request refused.", {
      status: 403,
      headers: { "content-type": "text/plain; charset=utf-8" },
    });
  }
  return NextResponse.next();
}

export const config = {
  // Static assets never change state; skip them.
  matcher: ["/((?!_next/static|_next/image|favicon.ico|icon.svg|fonts/).*)"],
};

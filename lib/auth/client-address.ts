import "server-only";

import { headers } from "next/headers";

/**
 * The address used for per-address rate limits. Behind a reverse proxy the first
 * x-forwarded-for entry is the client; a direct connection has no such header, and then all
 * header-less clients share one bucket (stricter, never looser).
 */
export async function getClientAddress(): Promise<string> {
  const h = await headers();
  const forwarded = h.get("x-forwarded-for")?.split(",")[0]?.trim();
  const address = forwarded || h.get("x-real-ip")?.trim() || "direct";
  return address.slice(0, 64);
}

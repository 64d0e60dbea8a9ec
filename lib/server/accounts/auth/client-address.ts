import "server-only";

import { headers } from "next/headers";

/**
 * The address used for per-address rate limits. `next start` fills x-forwarded-for from the
 * socket when the request has none, and a reverse proxy puts the client first. A client talking
 * to `next start` directly can send its own header and so pick its bucket: the per-account limit
 * still holds, and a deployment should sit behind a proxy that overwrites the header.
 * With no header at all every such client shares one bucket (stricter, never looser).
 */
export async function getClientAddress(): Promise<string> {
  const h = await headers();
  const forwarded = h.get("x-forwarded-for")?.split(",")[0]?.trim();
  const address = forwarded || h.get("x-real-ip")?.trim() || "direct";
  return address.slice(0, 64);
}

import "server-only";

import { headers } from "next/headers";

import { clientAddressFrom, trustedProxies } from "@/lib/server/http/client-peer";

/**
 * The address used for per-address rate limits in server actions: the socket address our
 * server records, or the forwarded one when a trusted proxy sent the request
 * (lib/server/http/client-peer.ts has the rule).
 */
export async function getClientAddress(): Promise<string> {
  const h = await headers();
  return clientAddressFrom((name) => h.get(name), trustedProxies());
}

import { PEER_HEADER } from "@/lib/server/http/client-peer";

import { unique } from "./db";

/**
 * The peer header scripts/serve.ts sets from the socket. Handlers called directly in a test have
 * no socket, so the test names the client: a fresh address unless one is given, so tests never
 * share one rate-limit bucket by accident.
 */
export function fromPeer(address: string = unique("peer")): Record<string, string> {
  return { [PEER_HEADER]: address };
}

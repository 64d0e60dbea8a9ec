/**
 * Who sent a request, decided from headers our own server writes (scripts/serve.ts). Pure, so
 * the server, the routes and the tests share one rule.
 *
 * - `x-craquelure-peer` is the socket's remote address; scripts/serve.ts drops any copy the
 *   client sent before setting it.
 * - X-Forwarded-For is believed only when that peer is a trusted proxy
 *   (CRAQUELURE_TRUSTED_PROXIES, comma-separated addresses). Then the client is the rightmost
 *   address in the header that is not itself a trusted proxy: everything left of it was written
 *   by the client and proves nothing.
 */
export const PEER_HEADER = "x-craquelure-peer";

/** Without our server in front (next dev, a handler called in a test) every client shares one key. */
export const UNKNOWN_PEER = "unknown";

const MAX_ADDRESS_LENGTH = 64;

/** `::ffff:127.0.0.1` and `127.0.0.1` are one client; keys stay short. */
export function normalizeAddress(address: string): string {
  const trimmed = address.trim().toLowerCase();
  const plain = trimmed.startsWith("::ffff:") && trimmed.includes(".") ? trimmed.slice(7) : trimmed;
  return plain.slice(0, MAX_ADDRESS_LENGTH);
}

/**
 * What scripts/serve.ts does to each request before Next sees it: every copy of the peer header
 * the client sent goes (from the parsed headers and the raw list), and the socket's address is
 * written. Only then can the header be believed.
 */
export function stampPeer(
  request: { headers: Record<string, string | string[] | undefined>; rawHeaders: string[] },
  socketAddress: string | undefined,
): void {
  const raw = request.rawHeaders;
  for (let i = raw.length - 2; i >= 0; i -= 2) {
    if (raw[i].toLowerCase() === PEER_HEADER) raw.splice(i, 2);
  }
  const peer = normalizeAddress(socketAddress ?? "");
  request.headers[PEER_HEADER] = peer;
  raw.push(PEER_HEADER, peer);
}

export function parseTrustedProxies(setting: string | undefined): Set<string> {
  return new Set(
    (setting ?? "")
      .split(",")
      .map((entry) => normalizeAddress(entry))
      .filter(Boolean),
  );
}

export function clientAddressFrom(
  get: (name: string) => string | null | undefined,
  trusted: Set<string>,
): string {
  const peer = normalizeAddress(get(PEER_HEADER) ?? "");
  if (!peer) return UNKNOWN_PEER;
  if (!trusted.has(peer)) return peer;
  const hops = (get("x-forwarded-for") ?? "")
    .split(",")
    .map((hop) => normalizeAddress(hop))
    .filter(Boolean);
  for (let i = hops.length - 1; i >= 0; i--) {
    if (!trusted.has(hops[i])) return hops[i];
  }
  // Every hop is one of ours (a health check from the proxy itself): the first one it names.
  return hops[0] ?? peer;
}

let cachedSetting: string | undefined;
let cachedTrusted = new Set<string>();

/** The trusted proxies from the environment, parsed once per value. */
export function trustedProxies(): Set<string> {
  const setting = process.env.CRAQUELURE_TRUSTED_PROXIES;
  if (setting !== cachedSetting) {
    cachedSetting = setting;
    cachedTrusted = parseTrustedProxies(setting);
  }
  return cachedTrusted;
}

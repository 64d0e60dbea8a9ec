import "server-only";

/**
 * The local mail page shows every password-reset and invitation link, so it is served only when
 * the operator asks for it (`scripts/start.sh --demo-mail`, which exports CRAQUELURE_DEMO_MAIL=1)
 * and only to requests addressed to the loopback interface. Anything else answers 404.
 *
 * What the Host check guarantees: a browser on another machine that reaches the app by its
 * network name or address (or through a reverse proxy that forwards the public Host) is refused.
 * What it does not guarantee: the Host header is chosen by the client, so a program on another
 * machine can send `Host: 127.0.0.1` on purpose. The real protection is that the setting is off by
 * default and that `scripts/start.sh` binds to 127.0.0.1; never enable it on a shared server.
 */
function demoMailEnabled(env: Record<string, string | undefined>): boolean {
  return env.CRAQUELURE_DEMO_MAIL === "1";
}

const LOOPBACK_HOSTS = new Set(["127.0.0.1", "localhost", "[::1]"]);

/**
 * The host name of a Host header without its port: "[::1]:3000" → "[::1]". Anything after the
 * name other than ":digits" leaves the header whole, so it matches no loopback name.
 */
export function hostName(hostHeader: string): string {
  const trimmed = hostHeader.trim().toLowerCase();
  const nameEnd = trimmed.startsWith("[") ? trimmed.indexOf("]") + 1 : trimmed.indexOf(":");
  if (nameEnd <= 0) return trimmed;
  const rest = trimmed.slice(nameEnd);
  return rest === "" || /^:\d{1,5}$/.test(rest) ? trimmed.slice(0, nameEnd) : trimmed;
}

export function isLoopbackHost(hostHeader: string | null | undefined): boolean {
  if (!hostHeader) return false;
  return LOOPBACK_HOSTS.has(hostName(hostHeader));
}

export interface DemoMailRequest {
  host: string | null;
  /** x-forwarded-host: set by a reverse proxy; when present it must be loopback too. */
  forwardedHost: string | null;
}

/** 200 when the page may be shown, 404 otherwise (the page then calls notFound()). */
export function demoMailStatus(
  env: Record<string, string | undefined>,
  request: DemoMailRequest,
): 200 | 404 {
  if (!demoMailEnabled(env)) return 404;
  if (!isLoopbackHost(request.host)) return 404;
  if (request.forwardedHost !== null && !isLoopbackHost(request.forwardedHost)) return 404;
  return 200;
}

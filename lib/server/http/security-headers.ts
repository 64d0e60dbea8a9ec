// The browser-side defences sent with every page and API answer. Pure, so the policy is
// unit-tested; proxy.ts draws the nonce per request and hands it to Next through the request's
// own Content-Security-Policy header (Next then stamps it on the scripts it renders).

export interface PolicyOptions {
  nonce: string;
  /** React's development build evaluates code for its error overlay; production never does. */
  dev?: boolean;
}

/**
 * Scripts: only those carrying this request's nonce, plus what they load ('strict-dynamic'
 * lets Next's chunk loader add its own script tags). Styles allow inline because Plotly writes
 * style attributes and a <style> element at run time; a style cannot run code. The solver runs
 * in a Web Worker from our origin (and a blob: URL in some bundler modes). Nothing may frame us.
 */
export function contentSecurityPolicy({ nonce, dev = false }: PolicyOptions): string {
  const directives: [string, string[]][] = [
    ["default-src", ["'self'"]],
    [
      "script-src",
      ["'self'", `'nonce-${nonce}'`, "'strict-dynamic'", ...(dev ? ["'unsafe-eval'"] : [])],
    ],
    ["style-src", ["'self'", "'unsafe-inline'"]],
    ["img-src", ["'self'", "blob:", "data:"]],
    ["font-src", ["'self'", "data:"]],
    ["worker-src", ["'self'", "blob:"]],
    ["connect-src", ["'self'"]],
    ["object-src", ["'none'"]],
    ["base-uri", ["'self'"]],
    ["form-action", ["'self'"]],
    ["frame-ancestors", ["'none'"]],
  ];
  return directives.map(([name, values]) => `${name} ${values.join(" ")}`).join("; ");
}

/** A fresh nonce: 128 random bits, base64 (what the CSP grammar accepts). */
export function newNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}

/** Headers every response carries besides the policy itself. */
const FIXED_SECURITY_HEADERS: Record<string, string> = {
  "x-content-type-options": "nosniff",
  "referrer-policy": "strict-origin-when-cross-origin",
  // For browsers that predate frame-ancestors.
  "x-frame-options": "DENY",
};

/** Every security header for one response, keyed lower-case. */
export function securityHeaders(options: PolicyOptions): Record<string, string> {
  return { "content-security-policy": contentSecurityPolicy(options), ...FIXED_SECURITY_HEADERS };
}

/**
 * The API's answers: JSON and files, never a page, so nothing may load or frame from them. Static
 * (next.config.ts sets them) because the proxy, which draws nonces, does not run for /api.
 */
export const API_SECURITY_HEADERS: Record<string, string> = {
  "content-security-policy": "default-src 'none'; frame-ancestors 'none'",
  ...FIXED_SECURITY_HEADERS,
};

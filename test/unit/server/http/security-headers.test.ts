import { describe, expect, it } from "vitest";

import {
  contentSecurityPolicy,
  newNonce,
  securityHeaders,
} from "@/lib/server/http/security-headers";

function directives(policy: string): Map<string, string[]> {
  return new Map(
    policy.split(";").map((part) => {
      const [name, ...values] = part.trim().split(/\s+/);
      return [name, values];
    }),
  );
}

describe("security headers", () => {
  it("allows scripts only by this request's nonce and never inline or eval in production", () => {
    const policy = directives(contentSecurityPolicy({ nonce: "abc123==" }));
    expect(policy.get("script-src")).toEqual(["'self'", "'nonce-abc123=='", "'strict-dynamic'"]);
    expect(policy.get("script-src")).not.toContain("'unsafe-inline'");
    expect(policy.get("object-src")).toEqual(["'none'"]);
    expect(policy.get("frame-ancestors")).toEqual(["'none'"]);
    expect(policy.get("worker-src")).toEqual(["'self'", "blob:"]);
    expect(policy.get("default-src")).toEqual(["'self'"]);
  });

  it("adds eval only for the development build", () => {
    const dev = directives(contentSecurityPolicy({ nonce: "n", dev: true }));
    expect(dev.get("script-src")).toContain("'unsafe-eval'");
    const prod = directives(contentSecurityPolicy({ nonce: "n" }));
    expect(prod.get("script-src")).not.toContain("'unsafe-eval'");
  });

  it("draws a different 128-bit nonce each time", () => {
    const nonces = new Set(Array.from({ length: 50 }, newNonce));
    expect(nonces.size).toBe(50);
    for (const nonce of nonces) expect(Buffer.from(nonce, "base64")).toHaveLength(16);
  });

  it("sends nosniff, a referrer policy and no framing alongside the policy", () => {
    const headers = securityHeaders({ nonce: "n" });
    expect(headers["x-content-type-options"]).toBe("nosniff");
    expect(headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
    expect(headers["x-frame-options"]).toBe("DENY");
    expect(headers["content-security-policy"]).toContain("'nonce-n'");
  });
});

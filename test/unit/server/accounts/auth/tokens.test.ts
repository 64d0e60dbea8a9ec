import { describe, expect, it } from "vitest";

import {
  hashToken,
  looksLikeToken,
  newToken,
  TOKEN_LIFETIMES,
  tokenState,
} from "@/lib/server/accounts/auth/tokens";

const NOW = new Date("2026-03-01T12:00:00Z");

describe("tokens", () => {
  it("issues 32 random bytes (43 base64url characters) and stores only their SHA-256", () => {
    const a = newToken("verification", NOW);
    const b = newToken("verification", NOW);
    expect(a.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(a.token).not.toBe(b.token);
    expect(a.hash).toBe(hashToken(a.token));
    expect(a.hash).toMatch(/^[0-9a-f]{64}$/);
    expect(a.hash).not.toContain(a.token);
  });

  it.each([
    ["verification", 48 * 3600_000],
    ["reset", 3600_000],
    ["invitation", 7 * 24 * 3600_000],
  ] as const)("%s links live for the stated time", (kind, ms) => {
    expect(TOKEN_LIFETIMES[kind]).toBe(ms);
    expect(newToken(kind, NOW).expiresAt.getTime() - NOW.getTime()).toBe(ms);
  });

  it("is valid until the expiry instant and expired from it on", () => {
    const expiresAt = new Date(NOW.getTime() + 1000);
    expect(tokenState({ expiresAt, usedAt: null }, NOW)).toBe("valid");
    expect(tokenState({ expiresAt, usedAt: null }, new Date(NOW.getTime() + 999))).toBe("valid");
    expect(tokenState({ expiresAt, usedAt: null }, expiresAt)).toBe("expired");
    expect(tokenState({ expiresAt, usedAt: null }, new Date(NOW.getTime() + 5000))).toBe("expired");
  });

  it("reports a used token as used, even once it has also expired", () => {
    const usedAt = new Date(NOW.getTime() - 10);
    expect(tokenState({ expiresAt: new Date(NOW.getTime() + 1000), usedAt }, NOW)).toBe("used");
    expect(tokenState({ expiresAt: new Date(NOW.getTime() - 1000), usedAt }, NOW)).toBe("used");
  });

  it("reports a missing row as unknown", () => {
    expect(tokenState(undefined, NOW)).toBe("unknown");
    expect(tokenState(null, NOW)).toBe("unknown");
  });

  it("rejects anything not shaped like our tokens before it reaches the database", () => {
    expect(looksLikeToken(newToken("reset").token)).toBe(true);
    expect(looksLikeToken("short")).toBe(false);
    expect(looksLikeToken("a".repeat(42) + "/")).toBe(false);
    expect(looksLikeToken(undefined)).toBe(false);
    expect(looksLikeToken(42)).toBe(false);
  });
});

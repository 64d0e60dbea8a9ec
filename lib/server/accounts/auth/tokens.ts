import "server-only";

import { createHash, randomBytes } from "node:crypto";

// Links in e-mails carry 32 random bytes; only their SHA-256 is stored, so the database alone
// cannot be turned into working links. A plain hash (no salt) is enough at 256 bits of entropy.

export const TOKEN_LIFETIMES = {
  verification: 48 * 60 * 60 * 1000,
  reset: 60 * 60 * 1000,
  invitation: 7 * 24 * 60 * 60 * 1000,
} as const;
export type TokenKind = keyof typeof TOKEN_LIFETIMES;

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export function newToken(
  kind: TokenKind,
  now: Date = new Date(),
): { token: string; hash: string; expiresAt: Date } {
  const token = randomBytes(32).toString("base64url");
  return {
    token,
    hash: hashToken(token),
    expiresAt: new Date(now.getTime() + TOKEN_LIFETIMES[kind]),
  };
}

export type TokenState = "valid" | "expired" | "used" | "unknown";

/** Used beats expired: telling someone "already used" is the more useful message. */
export function tokenState(
  row: { expiresAt: Date; usedAt: Date | null } | null | undefined,
  now: Date = new Date(),
): TokenState {
  if (!row) return "unknown";
  if (row.usedAt) return "used";
  if (row.expiresAt.getTime() <= now.getTime()) return "expired";
  return "valid";
}

/** Tokens arrive from URLs; reject anything that is not the shape we issue before hashing it. */
export function looksLikeToken(value: unknown): value is string {
  return typeof value === "string" && /^[A-Za-z0-9_-]{43}$/.test(value);
}

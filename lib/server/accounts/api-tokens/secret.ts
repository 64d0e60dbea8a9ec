import "server-only";

import { createHash, randomBytes } from "node:crypto";

// A personal API token is "crq_" + 32 random bytes (base64url). Only its SHA-256 is stored; at
// 256 bits of entropy a plain hash is enough. The prefix makes a leaked token easy to spot.
const API_TOKEN_PREFIX = "crq_";
const SHAPE = /^crq_[A-Za-z0-9_-]{43}$/;

export function hashApiToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export function newApiToken(): { token: string; hash: string; prefix: string } {
  const token = API_TOKEN_PREFIX + randomBytes(32).toString("base64url");
  return { token, hash: hashApiToken(token), prefix: token.slice(0, 10) };
}

export function looksLikeApiToken(value: string): boolean {
  return SHAPE.test(value);
}

/** The token of an `Authorization: Bearer …` header; null when the header is absent. */
export function bearerOf(request: Request): string | null {
  const header = request.headers.get("authorization");
  if (header === null) return null;
  const match = /^Bearer\s+(\S+)\s*$/i.exec(header);
  return match ? match[1] : "";
}

import "server-only";

import type { Db } from "@/db/client";
import { countShareMisses, viewLiveShareLink } from "@/db/queries/share-links";
import { AppError } from "@/lib/shared/errors";
import { hitRateLimit, type RateLimitRule } from "@/lib/server/access/rate-limit";

import { hashShareToken, looksLikeShareToken } from "./share-links";

export const SHARE_GONE_MESSAGE = "This link is no longer available.";

// Only misses count: someone opening a real link many times is never blocked, someone trying
// tokens is, after a few dozen misses per address (128-bit tokens make guessing hopeless anyway;
// the limit keeps the scanning off the database).
export const SHARE_MISS_RULE: RateLimitRule = { limit: 30, windowMs: 15 * 60 * 1000 };

export interface SharedRevisionResponse {
  teamName: string;
  scenario: { name: string; materialLabel: string };
  revision: {
    number: number;
    message: string;
    savedAt: string;
    authorName: string | null;
    reviewState: string;
  };
  expiresAt: string;
  file: Record<string, unknown>;
}

async function missesSoFar(db: Db, key: string, now: Date): Promise<number> {
  const windowStart = new Date(
    Math.floor(now.getTime() / SHARE_MISS_RULE.windowMs) * SHARE_MISS_RULE.windowMs,
  );
  return countShareMisses(db, key, windowStart);
}

/** The public read of one shared revision; every failure looks the same from outside. */
export async function openSharedRevision(
  db: Db,
  token: unknown,
  clientAddress: string,
  now: Date = new Date(),
): Promise<SharedRevisionResponse> {
  const key = `share-miss:address:${clientAddress}`;
  if ((await missesSoFar(db, key, now)) >= SHARE_MISS_RULE.limit) {
    throw new AppError(
      "rate-limited:share",
      "Too many attempts. Please wait a while and try again.",
    );
  }
  const view = looksLikeShareToken(token)
    ? await viewLiveShareLink(db, hashShareToken(token), now)
    : null;
  if (!view) {
    await hitRateLimit(db, key, SHARE_MISS_RULE, now);
    throw new AppError("not-found:share", SHARE_GONE_MESSAGE);
  }
  return {
    teamName: view.teamName,
    scenario: { name: view.scenarioName, materialLabel: view.materialLabel },
    revision: {
      number: view.number,
      message: view.message,
      savedAt: view.savedAt.toISOString(),
      authorName: view.authorName,
      reviewState: view.reviewState,
    },
    expiresAt: view.expiresAt.toISOString(),
    file: view.file,
  };
}

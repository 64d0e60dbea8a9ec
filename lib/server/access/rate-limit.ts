import "server-only";

import type { Executor } from "@/db/client";
import { countRateLimitHit, deleteOlderRateLimitWindows } from "@/db/queries/rate-limits";

import { AppError } from "../../shared/errors";
import type { ThrottleRule } from "./throttle-delay";

export interface RateLimitRule {
  /** Attempts allowed per window. */
  limit: number;
  windowMs: number;
}

// Sign-in counts failures only and slows down before it refuses (lib/server/accounts/
// sign-in-throttle.ts). The account's counter is kept per account AND client address, so a
// guesser elsewhere never refuses the owner; the per-address counter (every account tried from
// one address) is looser because a lab or an office may share one address.
export const SIGN_IN_THROTTLE = {
  accountAddress: { softLimit: 5, hardLimit: 50, windowMs: 15 * 60 * 1000 },
  address: { softLimit: 30, hardLimit: 300, windowMs: 15 * 60 * 1000 },
} satisfies Record<string, ThrottleRule>;

export const RATE_LIMITS = {
  resetAccount: { limit: 3, windowMs: 60 * 60 * 1000 },
  resetAddress: { limit: 20, windowMs: 60 * 60 * 1000 },
  // Sign-up and invitations write mail to an address someone typed: cap both per address.
  signUpAccount: { limit: 3, windowMs: 60 * 60 * 1000 },
  signUpAddress: { limit: 10, windowMs: 60 * 60 * 1000 },
  invitationActor: { limit: 30, windowMs: 60 * 60 * 1000 },
  invitationEmail: { limit: 5, windowMs: 60 * 60 * 1000 },
} satisfies Record<string, RateLimitRule>;

/**
 * Count one attempt against `key` and say whether it is within the rule. A single upsert keeps
 * it atomic under concurrent requests; old windows of the same key are dropped on the way.
 */
export async function hitRateLimit(
  db: Executor,
  key: string,
  rule: RateLimitRule,
  now: Date = new Date(),
): Promise<{ allowed: boolean; retryAfterSeconds: number }> {
  const windowStart = windowStartOf(now, rule.windowMs);
  const count = await countRateLimitHit(db, key, windowStart);
  await deleteOlderRateLimitWindows(db, key, windowStart);
  const retryAfterSeconds = Math.ceil(
    (windowStart.getTime() + rule.windowMs - now.getTime()) / 1000,
  );
  return { allowed: count <= rule.limit, retryAfterSeconds };
}

/** The start of the fixed window `now` falls in. */
export function windowStartOf(now: Date, windowMs: number): Date {
  return new Date(Math.floor(now.getTime() / windowMs) * windowMs);
}

/** Throw the user-facing error when any of the given keys is over its rule. */
export async function enforceRateLimits(
  db: Executor,
  scope: string,
  checks: { key: string; rule: RateLimitRule }[],
  now: Date = new Date(),
): Promise<void> {
  let wait = 0;
  for (const { key, rule } of checks) {
    const result = await hitRateLimit(db, key, rule, now);
    if (!result.allowed) wait = Math.max(wait, result.retryAfterSeconds);
  }
  if (wait > 0) {
    const minutes = Math.max(1, Math.ceil(wait / 60));
    throw new AppError(
      `rate-limited:${scope}`,
      `Too many attempts. Please wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again.`,
    );
  }
}

import "server-only";

import type { Executor } from "@/db/client";
import { deleteRateLimitKey, peekRateLimitCount } from "@/db/queries/rate-limits";
import { hitRateLimit, SIGN_IN_THROTTLE, windowStartOf } from "@/lib/server/access/rate-limit";
import { throttleDecision, type ThrottleRule } from "@/lib/server/access/throttle-delay";
import { AppError } from "@/lib/shared/errors";

/** Waits `ms` milliseconds; injected so tests record the delay instead of sleeping. */
export type Sleeper = (ms: number) => Promise<void>;

/** A timer, never a busy wait: the event loop serves other requests meanwhile. */
export const sleepFor: Sleeper = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

interface Counter {
  key: string;
  rule: ThrottleRule;
}

/** The two failure counters of a sign-in: this account from this address, and this address. */
export function signInCounters(email: string, clientAddress: string) {
  return {
    accountAddress: {
      key: `sign-in:account:${email}:${clientAddress}`,
      rule: SIGN_IN_THROTTLE.accountAddress,
    },
    address: { key: `sign-in:address:${clientAddress}`, rule: SIGN_IN_THROTTLE.address },
  } satisfies Record<string, Counter>;
}

/**
 * Before the password is checked: read the failures so far (no attempt is counted here), refuse
 * far past the limit, else wait the longest delay either counter asks for.
 */
export async function throttleSignIn(
  db: Executor,
  counters: Counter[],
  now: Date,
  sleep: Sleeper,
): Promise<void> {
  let delayMs = 0;
  let refusedUntil = 0;
  for (const { key, rule } of counters) {
    const windowStart = windowStartOf(now, rule.windowMs);
    const failures = await peekRateLimitCount(db, key, windowStart);
    const decision = throttleDecision(failures, rule);
    if (decision.refuse) {
      refusedUntil = Math.max(refusedUntil, windowStart.getTime() + rule.windowMs);
    } else {
      delayMs = Math.max(delayMs, decision.delayMs);
    }
  }
  if (refusedUntil > 0) {
    const minutes = Math.max(1, Math.ceil((refusedUntil - now.getTime()) / 60_000));
    throw new AppError(
      "rate-limited:sign-in",
      `Too many failed sign-ins from this network address. Please wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again.`,
    );
  }
  if (delayMs > 0) await sleep(delayMs);
}

/** A wrong password or an unknown account: count it on every counter. */
export async function countSignInFailure(
  db: Executor,
  counters: Counter[],
  now: Date,
): Promise<void> {
  for (const { key, rule } of counters) {
    await hitRateLimit(db, key, { limit: rule.hardLimit, windowMs: rule.windowMs }, now);
  }
}

/** The owner got in from here: their mistypes from this address no longer count. */
export async function clearSignInFailures(db: Executor, counter: Counter): Promise<void> {
  await deleteRateLimitKey(db, counter.key);
}

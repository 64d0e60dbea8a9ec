import "server-only";

/**
 * A limit that slows down before it refuses: up to `softLimit` failures in a window answer at
 * once, past it each answer waits longer, and only at `hardLimit` is the attempt refused. Used
 * for sign-in, where a hard lock-out at a low count would let anyone shut the owner out.
 */
export interface ThrottleRule {
  softLimit: number;
  hardLimit: number;
  windowMs: number;
}

/** The first wait past the soft limit; each further failure doubles it up to the cap. */
export const FIRST_DELAY_MS = 500;
export const MAX_DELAY_MS = 4000;

export type ThrottleDecision = { refuse: true } | { refuse: false; delayMs: number };

/**
 * What to do with an attempt when `failures` failures are already counted in the rule's
 * window: answer at once, answer after a growing delay, or refuse.
 */
export function throttleDecision(failures: number, rule: ThrottleRule): ThrottleDecision {
  if (failures >= rule.hardLimit) return { refuse: true };
  if (failures < rule.softLimit) return { refuse: false, delayMs: 0 };
  const doublings = failures - rule.softLimit;
  // Cap the exponent before raising 2 to it: a count in the hundreds must not reach Infinity.
  const delayMs = FIRST_DELAY_MS * 2 ** Math.min(doublings, 16);
  return { refuse: false, delayMs: Math.min(delayMs, MAX_DELAY_MS) };
}

import { describe, expect, it } from "vitest";

import {
  FIRST_DELAY_MS,
  MAX_DELAY_MS,
  throttleDecision,
  type ThrottleRule,
} from "@/lib/server/access/throttle-delay";

const rule: ThrottleRule = { softLimit: 5, hardLimit: 50, windowMs: 15 * 60 * 1000 };

describe("throttleDecision (slow down before refusing)", () => {
  it("answers at once below the soft limit", () => {
    for (const failures of [0, 1, 4]) {
      expect(throttleDecision(failures, rule)).toEqual({ refuse: false, delayMs: 0 });
    }
  });

  it("waits half a second at the soft limit and doubles with each further failure", () => {
    const delays = [5, 6, 7].map((failures) => throttleDecision(failures, rule));
    expect(delays).toEqual([
      { refuse: false, delayMs: 500 },
      { refuse: false, delayMs: 1000 },
      { refuse: false, delayMs: 2000 },
    ]);
    expect(FIRST_DELAY_MS).toBe(500);
  });

  it("caps the wait at a few seconds however many failures", () => {
    for (const failures of [8, 9, 20, 49]) {
      expect(throttleDecision(failures, rule)).toEqual({ refuse: false, delayMs: MAX_DELAY_MS });
    }
    expect(MAX_DELAY_MS).toBe(4000);
    const wide: ThrottleRule = { softLimit: 0, hardLimit: 10_000, windowMs: 1 };
    expect(throttleDecision(5000, wide)).toEqual({ refuse: false, delayMs: MAX_DELAY_MS });
  });

  it("refuses only at the hard limit", () => {
    expect(throttleDecision(49, rule).refuse).toBe(false);
    expect(throttleDecision(50, rule)).toEqual({ refuse: true });
    expect(throttleDecision(500, rule)).toEqual({ refuse: true });
  });
});

import { afterEach, describe, expect, it, vi } from "vitest";

import { sleepFor } from "@/lib/server/accounts/sign-in-throttle";

afterEach(() => {
  vi.useRealTimers();
});

describe("the sign-in throttle's wait", () => {
  it("is a timer that leaves the event loop free, not a busy wait", async () => {
    vi.useFakeTimers();
    let done = false;
    const waiting = sleepFor(500).then(() => {
      done = true;
    });
    // Had it spun, control would not come back here before the wait was over.
    await vi.advanceTimersByTimeAsync(499);
    expect(done).toBe(false);
    await vi.advanceTimersByTimeAsync(1);
    await waiting;
    expect(done).toBe(true);
  });
});

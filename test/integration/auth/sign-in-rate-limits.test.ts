import { describe, expect, it, vi } from "vitest";

import { rateLimitBuckets } from "@/db/schema/rate-limits";
import { SIGN_IN_THROTTLE, windowStartOf } from "@/lib/server/access/rate-limit";
import { authenticate } from "@/lib/server/accounts/sign-in";
import { signInCounters } from "@/lib/server/accounts/sign-in-throttle";
import { statusOf } from "@/lib/server/http/respond";
import { isAppError } from "@/lib/shared/errors";

import { makeUser, openTestDb, TEST_PASSWORD, unique } from "../support/db";
import { outcome } from "../support/outcome";

// A time limit, not a speed goal: each attempt hashes a password (scrypt, N = 2^17), a dozen per
// test; under load they outlast 30 s.
vi.setConfig({ testTimeout: 120000 });

const db = openTestDb();
const WRONG = "wrong guess";
const accountRule = SIGN_IN_THROTTLE.accountAddress;
const addressRule = SIGN_IN_THROTTLE.address;

/** Stands in for the timer: records each wait instead of sleeping. */
function recordingSleeper() {
  const waits: number[] = [];
  return { waits, sleep: async (ms: number) => void waits.push(ms) };
}

/** Sets the count of failures for a counter in the current window (cheaper than as many hashes). */
async function storeFailures(key: string, windowMs: number, count: number, now = new Date()) {
  await db
    .insert(rateLimitBuckets)
    .values({ key, windowStart: windowStartOf(now, windowMs), count })
    .onConflictDoUpdate({
      target: [rateLimitBuckets.key, rateLimitBuckets.windowStart],
      set: { count },
    });
}

describe("security: rate limits key on account and address and count failures only", () => {
  it("ten wrong passwords from address A do not stop the owner from address B", async () => {
    // One instant for the whole test, so no attempt falls into the next window.
    const now = new Date();
    const user = await makeUser(db);
    const fromA = recordingSleeper();
    const addressA = unique("ip");
    for (let i = 0; i < 10; i++) {
      expect(
        await outcome(
          authenticate(db, { email: user.email, password: WRONG }, addressA, now, fromA.sleep),
        ),
      ).toBe("invalid:credentials");
    }
    const fromB = recordingSleeper();
    const found = await authenticate(
      db,
      { email: user.email, password: TEST_PASSWORD },
      unique("ip"),
      now,
      fromB.sleep,
    );
    expect(found.id).toBe(user.id);
    expect(fromB.waits).toEqual([]);

    // Even a guesser far past the refusal at A leaves the owner at B alone.
    await storeFailures(
      signInCounters(user.email, addressA).accountAddress.key,
      accountRule.windowMs,
      500,
      now,
    );
    expect(
      await outcome(
        authenticate(db, { email: user.email, password: TEST_PASSWORD }, unique("ip"), now),
      ),
    ).toBeNull();
  });

  it("successful sign-ins do not count, and one clears the mistypes before it", async () => {
    // One instant for the whole test, so no attempt falls into the next window.
    const now = new Date();
    const user = await makeUser(db);
    const address = unique("ip");
    const lab = recordingSleeper();
    const signIn = (password: string) =>
      outcome(authenticate(db, { email: user.email, password }, address, now, lab.sleep));
    // More successes than the old limit of ten attempts, from one address.
    for (let i = 0; i < 12; i++) expect(await signIn(TEST_PASSWORD)).toBeNull();
    // Mistypes up to one short of the soft limit, a success, then as many again and one more:
    // had the success not cleared the counter, the last ones would wait.
    for (let i = 0; i < accountRule.softLimit - 1; i++) await signIn(WRONG);
    expect(await signIn(TEST_PASSWORD)).toBeNull();
    for (let i = 0; i < accountRule.softLimit; i++) {
      expect(await signIn(WRONG)).toBe("invalid:credentials");
    }
    expect(lab.waits).toEqual([]);
  });

  it("failures past the soft limit are delayed, growing, not refused", async () => {
    // One instant for the whole test, so no attempt falls into the next window.
    const now = new Date();
    const user = await makeUser(db);
    const address = unique("ip");
    const lab = recordingSleeper();
    const signIn = (password: string) =>
      outcome(authenticate(db, { email: user.email, password }, address, now, lab.sleep));
    for (let i = 0; i < accountRule.softLimit + 3; i++) {
      expect(await signIn(WRONG)).toBe("invalid:credentials");
    }
    // Failures 6, 7 and 8 waited 0.5 s, doubling (lib/server/access/throttle-delay.ts).
    expect(lab.waits).toEqual([500, 1000, 2000]);
    // The owner at the same shared PC still gets in, after the capped wait.
    expect(await signIn(TEST_PASSWORD)).toBeNull();
    expect(lab.waits).toEqual([500, 1000, 2000, 4000]);
  });

  it("far beyond the soft limit the account at that address answers 429 with the message, until the window ends", async () => {
    // One instant for the whole test, so no attempt falls into the next window.
    const now = new Date();
    const user = await makeUser(db);
    const address = unique("ip");
    const counter = signInCounters(user.email, address).accountAddress;
    await storeFailures(counter.key, accountRule.windowMs, accountRule.hardLimit, now);
    let refusal: unknown;
    try {
      await authenticate(db, { email: user.email, password: TEST_PASSWORD }, address, now);
    } catch (error) {
      refusal = error;
    }
    expect(isAppError(refusal) && refusal.code).toBe("rate-limited:sign-in");
    expect(statusOf("rate-limited:sign-in")).toBe(429);
    expect(isAppError(refusal) && refusal.message).toMatch(
      /^Too many failed sign-ins from this network address\. Please wait \d+ minutes? and try again\.$/,
    );
    // Another address is not refused; the next window opens again.
    expect(
      await outcome(
        authenticate(db, { email: user.email, password: TEST_PASSWORD }, unique("ip"), now),
      ),
    ).toBeNull();
    const later = new Date(now.getTime() + accountRule.windowMs);
    expect(
      await outcome(
        authenticate(db, { email: user.email, password: TEST_PASSWORD }, address, later),
      ),
    ).toBeNull();
  });

  it("one address trying many accounts is slowed past its looser soft limit and refused far beyond", async () => {
    // One instant for the whole test, so no attempt falls into the next window.
    const now = new Date();
    const user = await makeUser(db);
    const slowed = unique("ip");
    await storeFailures(
      signInCounters(user.email, slowed).address.key,
      addressRule.windowMs,
      addressRule.softLimit,
      now,
    );
    const lab = recordingSleeper();
    expect(
      await outcome(
        authenticate(db, { email: user.email, password: TEST_PASSWORD }, slowed, now, lab.sleep),
      ),
    ).toBeNull();
    expect(lab.waits).toEqual([500]);

    const spraying = unique("ip");
    await storeFailures(
      signInCounters(user.email, spraying).address.key,
      addressRule.windowMs,
      addressRule.hardLimit,
      now,
    );
    expect(
      await outcome(
        authenticate(db, { email: user.email, password: TEST_PASSWORD }, spraying, now),
      ),
    ).toBe("rate-limited:sign-in");
  });
});

import { scryptSync } from "node:crypto";

import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";

import { users } from "@/db/schema/users";
import { authenticate } from "@/lib/server/accounts/sign-in";
import { hitRateLimit, RATE_LIMITS } from "@/lib/server/access/rate-limit";

import { makeUser, openTestDb, TEST_PASSWORD, unique } from "../support/db";
import { failedField, outcome } from "../support/outcome";

// A time limit, not a speed goal: the lock-out tests hash a password per attempt (scrypt, N =
// 2^17); under load they outlast 30 s.
vi.setConfig({ testTimeout: 120000 });

const db = openTestDb();

describe("sign-in", () => {
  it("accepts the right password, with the address in any case", async () => {
    const user = await makeUser(db);
    const found = await authenticate(
      db,
      { email: user.email.toUpperCase(), password: TEST_PASSWORD },
      unique("ip"),
    );
    expect(found.id).toBe(user.id);
  });

  it("answers a wrong password and an unknown account alike, beside the password field", async () => {
    const user = await makeUser(db);
    const wrong = authenticate(
      db,
      { email: user.email, password: "not the password" },
      unique("ip"),
    );
    const unknown = authenticate(
      db,
      { email: `${unique("nobody")}@test.craquelure.local`, password: "x" },
      unique("ip"),
    );
    expect(await outcome(wrong)).toBe("invalid:credentials");
    expect(await failedField(unknown)).toBe("password");
  });

  it("lets an unconfirmed user sign in (teams stay closed until confirmation)", async () => {
    const user = await makeUser(db, { verified: false });
    const found = await authenticate(
      db,
      { email: user.email, password: TEST_PASSWORD },
      unique("ip"),
    );
    expect(found.verifiedAt).toBeNull();
  });

  it("locks one account after too many attempts, even with the right password, from any address", async () => {
    const user = await makeUser(db);
    for (let i = 0; i < RATE_LIMITS.signInAccount.limit; i++) {
      expect(
        await outcome(
          authenticate(db, { email: user.email, password: "wrong guess" }, unique("ip")),
        ),
      ).toBe("invalid:credentials");
    }
    const right = authenticate(db, { email: user.email, password: TEST_PASSWORD }, unique("ip"));
    expect(await outcome(right)).toBe("rate-limited:sign-in");
    // Another account is not affected.
    const other = await makeUser(db);
    expect(
      await outcome(
        authenticate(db, { email: other.email, password: TEST_PASSWORD }, unique("ip")),
      ),
    ).toBeNull();
  });

  it("locks one address after too many attempts across accounts", async () => {
    const address = unique("ip");
    // Earlier attempts from this address (against other accounts) have used up its window.
    for (let i = 0; i < RATE_LIMITS.signInAddress.limit; i++) {
      await hitRateLimit(db, `sign-in:address:${address}`, RATE_LIMITS.signInAddress);
    }
    const user = await makeUser(db);
    expect(
      await outcome(authenticate(db, { email: user.email, password: TEST_PASSWORD }, address)),
    ).toBe("rate-limited:sign-in");
    expect(
      await outcome(authenticate(db, { email: user.email, password: TEST_PASSWORD }, unique("ip"))),
    ).toBeNull();
  });

  it("opens again in the next window", async () => {
    const user = await makeUser(db);
    const address = unique("ip");
    const now = new Date();
    for (let i = 0; i <= RATE_LIMITS.signInAccount.limit; i++) {
      await outcome(authenticate(db, { email: user.email, password: "wrong guess" }, address, now));
    }
    expect(
      await outcome(authenticate(db, { email: user.email, password: TEST_PASSWORD }, address, now)),
    ).toBe("rate-limited:sign-in");
    const later = new Date(now.getTime() + RATE_LIMITS.signInAccount.windowMs);
    expect(
      await outcome(
        authenticate(db, { email: user.email, password: TEST_PASSWORD }, address, later),
      ),
    ).toBeNull();
  });
});

describe("security: passwords (rehash at sign-in)", () => {
  it("brings a record of the old format up to today's cost at the next successful sign-in", async () => {
    const user = await makeUser(db);
    // The format written before self-describing records: hex key, hex salt, N = 2^15, r = 8.
    const salt = Buffer.from("0123456789abcdef0123456789abcdef", "hex");
    const key = scryptSync(TEST_PASSWORD.normalize("NFKC"), salt, 64, {
      N: 2 ** 15,
      r: 8,
      p: 1,
      maxmem: 64 * 1024 * 1024,
    });
    await db
      .update(users)
      .set({ passwordHash: key.toString("hex"), passwordSalt: salt.toString("hex") })
      .where(eq(users.id, user.id));
    await authenticate(db, { email: user.email, password: TEST_PASSWORD }, unique("ip"));
    const [row] = await db.select().from(users).where(eq(users.id, user.id));
    expect(row.passwordHash).toMatch(/^\$scrypt\$ln=17,r=8,p=1\$/);
    expect(row.passwordSalt).toBe("");
    // And the upgraded record still opens with the same password.
    const again = await authenticate(
      db,
      { email: user.email, password: TEST_PASSWORD },
      unique("ip"),
    );
    expect(again.id).toBe(user.id);
  });
});

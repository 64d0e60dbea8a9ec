import { scryptSync } from "node:crypto";

import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";

import { users } from "@/db/schema/users";
import { authenticate } from "@/lib/server/accounts/sign-in";

import { makeUser, openTestDb, TEST_PASSWORD, unique } from "../support/db";
import { failedField, outcome } from "../support/outcome";

// A time limit, not a speed goal: each sign-in hashes a password (scrypt, N = 2^17); under load
// a file of them outlasts 30 s. The throttle's own tests are in sign-in-rate-limits.test.ts.
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

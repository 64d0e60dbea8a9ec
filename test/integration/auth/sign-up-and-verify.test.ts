import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { emailVerificationTokens, users } from "@/db/schema/users";
import { signUp } from "@/lib/server/accounts/sign-up";
import { verifyEmail } from "@/lib/server/accounts/verify-email";

import { openTestDb, queuedMailTo, recordingMailer, tokenFromLink, unique } from "../support/db";
import { failedField, outcome } from "../support/outcome";

const db = openTestDb();
const PASSWORD = "twelve chars or more";

function newEmail() {
  return `${unique("signup")}@test.craquelure.local`;
}

async function countUsers(email: string) {
  return (await db.select().from(users).where(eq(users.email, email.toLowerCase()))).length;
}

describe("sign-up", () => {
  it("creates an unverified account with a lower-cased address and queues a confirmation link", async () => {
    const mail = recordingMailer();
    const email = newEmail();
    await signUp(
      db,
      { name: "Ada", email: `  ${email.toUpperCase()} `, password: PASSWORD },
      unique("ip"),
      mail,
    );
    const [user] = await db.select().from(users).where(eq(users.email, email));
    expect(user.verifiedAt).toBeNull();
    expect(user.passwordHash).not.toContain(PASSWORD);
    // Never sent inline: the outbox sender delivers it after the answer.
    expect(mail.sent).toHaveLength(0);
    const queued = await queuedMailTo(db, email);
    expect(queued).toHaveLength(1);
    expect(queued[0].text).toContain("http://app.test/verify/");
  });

  it("a second sign-up with a known address, whatever its case, creates nothing", async () => {
    const email = newEmail();
    await signUp(db, { name: "Ada", email, password: PASSWORD }, unique("ip"), recordingMailer());
    const again = await signUp(
      db,
      { name: "Eve", email: email.toUpperCase(), password: PASSWORD },
      unique("ip"),
      recordingMailer(),
    );
    expect(again.userId).toBeNull();
    expect(await countUsers(email)).toBe(1);
    const [user] = await db.select().from(users).where(eq(users.email, email));
    expect(user.name).toBe("Ada");
  });

  it("refuses a password shorter than 12 characters and creates nothing", async () => {
    const email = newEmail();
    const attempt = signUp(
      db,
      { name: "Ada", email, password: "elevenchars" },
      unique("ip"),
      recordingMailer(),
    );
    expect(await failedField(attempt)).toBe("password");
    expect(await countUsers(email)).toBe(0);
  });

  it("refuses a malformed address and forged extra fields change nothing", async () => {
    expect(
      await outcome(
        signUp(
          db,
          { name: "A", email: "not-an-address", password: PASSWORD },
          unique("ip"),
          recordingMailer(),
        ),
      ),
    ).toBe("invalid:email");
    const email = newEmail();
    // A forged verifiedAt in the payload must not skip confirmation.
    await signUp(
      db,
      { name: "A", email, password: PASSWORD, verifiedAt: new Date() },
      unique("ip"),
      recordingMailer(),
    );
    const [user] = await db.select().from(users).where(eq(users.email, email));
    expect(user.verifiedAt).toBeNull();
  });
});

describe("e-mail confirmation", () => {
  async function signUpAndGetToken() {
    const email = newEmail();
    const { userId } = await signUp(
      db,
      { name: "Ada", email, password: PASSWORD },
      unique("ip"),
      recordingMailer(),
    );
    const [mail] = await queuedMailTo(db, email);
    return { userId: userId!, token: tokenFromLink(mail, "/verify") };
  }

  it("confirms the address once; the same link then says it was used", async () => {
    const { userId, token } = await signUpAndGetToken();
    await verifyEmail(db, token);
    const [user] = await db.select().from(users).where(eq(users.id, userId));
    expect(user.verifiedAt).not.toBeNull();
    expect(await outcome(verifyEmail(db, token))).toBe("used:token");
  });

  it("refuses an expired link and leaves the account unconfirmed", async () => {
    const { userId, token } = await signUpAndGetToken();
    const later = new Date(Date.now() + 49 * 3600_000);
    expect(await outcome(verifyEmail(db, token, later))).toBe("expired:token");
    const [user] = await db.select().from(users).where(eq(users.id, userId));
    expect(user.verifiedAt).toBeNull();
  });

  it("refuses unknown and malformed tokens", async () => {
    expect(await outcome(verifyEmail(db, "A".repeat(43)))).toBe("not-found:token");
    expect(await outcome(verifyEmail(db, "../../etc"))).toBe("not-found:token");
  });

  it("stores only the hash of the token", async () => {
    const { userId, token } = await signUpAndGetToken();
    const rows = await db
      .select()
      .from(emailVerificationTokens)
      .where(eq(emailVerificationTokens.userId, userId));
    expect(rows).toHaveLength(1);
    expect(rows[0].tokenHash).not.toBe(token);
    expect(rows[0].tokenHash).toMatch(/^[0-9a-f]{64}$/);
  });
});

import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { sessions } from "@/db/schema/sessions";
import { users } from "@/db/schema/users";
import { requestPasswordReset, resetPassword } from "@/lib/server/accounts/password-reset";
import { authenticate } from "@/lib/server/accounts/sign-in";
import { createLucia } from "@/lib/server/accounts/auth/lucia";
import { createSessionToken } from "@/lib/server/accounts/auth/session-token";
import { RATE_LIMITS } from "@/lib/server/access/rate-limit";

import {
  makeUser,
  openTestDb,
  queuedMailTo,
  recordingMailer,
  TEST_PASSWORD,
  tokenFromLink,
  unique,
} from "../support/db";
import { failedField, outcome } from "../support/outcome";

const db = openTestDb();
const NEW_PASSWORD = "a brand new password";

async function requestToken(email: string) {
  await requestPasswordReset(db, { email }, unique("ip"), recordingMailer());
  return tokenFromLink((await queuedMailTo(db, email)).at(-1), "/reset");
}

describe("password reset", () => {
  it("sets the new password, ends every session, and the old password stops working", async () => {
    const user = await makeUser(db);
    const lucia = createLucia(db, { secureCookies: false });
    await createSessionToken(lucia, user.id);
    await createSessionToken(lucia, user.id);
    const token = await requestToken(user.email);
    await resetPassword(db, { token, password: NEW_PASSWORD, confirm: NEW_PASSWORD });
    expect(await db.select().from(sessions).where(eq(sessions.userId, user.id))).toHaveLength(0);
    expect(
      await outcome(authenticate(db, { email: user.email, password: TEST_PASSWORD }, unique("ip"))),
    ).toBe("invalid:credentials");
    expect(
      await outcome(authenticate(db, { email: user.email, password: NEW_PASSWORD }, unique("ip"))),
    ).toBeNull();
  });

  it("works once: a reused link is refused and the password stays", async () => {
    const user = await makeUser(db);
    const token = await requestToken(user.email);
    await resetPassword(db, { token, password: NEW_PASSWORD, confirm: NEW_PASSWORD });
    const again = resetPassword(db, {
      token,
      password: "yet another password",
      confirm: "yet another password",
    });
    expect(await outcome(again)).toBe("used:token");
    expect(
      await outcome(authenticate(db, { email: user.email, password: NEW_PASSWORD }, unique("ip"))),
    ).toBeNull();
  });

  it("refuses a link older than one hour and changes nothing", async () => {
    const user = await makeUser(db);
    const [before] = await db.select().from(users).where(eq(users.id, user.id));
    const token = await requestToken(user.email);
    const later = new Date(Date.now() + 61 * 60_000);
    expect(
      await outcome(
        resetPassword(db, { token, password: NEW_PASSWORD, confirm: NEW_PASSWORD }, later),
      ),
    ).toBe("expired:token");
    const [after] = await db.select().from(users).where(eq(users.id, user.id));
    expect(after.passwordHash).toBe(before.passwordHash);
  });

  it("refuses a short or mismatched new password beside its field", async () => {
    const user = await makeUser(db);
    const token = await requestToken(user.email);
    expect(
      await failedField(resetPassword(db, { token, password: "short", confirm: "short" })),
    ).toBe("password");
    expect(
      await failedField(
        resetPassword(db, { token, password: NEW_PASSWORD, confirm: "something else" }),
      ),
    ).toBe("confirm");
    // Refusals did not use the link up.
    expect(
      await outcome(resetPassword(db, { token, password: NEW_PASSWORD, confirm: NEW_PASSWORD })),
    ).toBeNull();
  });

  it("answers the same for an unknown address and sends nothing", async () => {
    const mail = recordingMailer();
    const ghost = `${unique("ghost")}@test.craquelure.local`;
    await requestPasswordReset(db, { email: ghost }, unique("ip"), mail);
    expect(mail.sent).toHaveLength(0);
    expect(await queuedMailTo(db, ghost)).toHaveLength(0);
  });

  it("limits requests per account and per address", async () => {
    const user = await makeUser(db);
    const mail = recordingMailer();
    for (let i = 0; i < RATE_LIMITS.resetAccount.limit; i++) {
      await requestPasswordReset(db, { email: user.email }, unique("ip"), mail);
    }
    expect(await outcome(requestPasswordReset(db, { email: user.email }, unique("ip"), mail))).toBe(
      "rate-limited:reset",
    );
    expect(await queuedMailTo(db, user.email)).toHaveLength(RATE_LIMITS.resetAccount.limit);

    const address = unique("ip");
    for (let i = 0; i < RATE_LIMITS.resetAddress.limit; i++) {
      await requestPasswordReset(
        db,
        { email: `${unique("probe")}@test.craquelure.local` },
        address,
        mail,
      );
    }
    const other = await makeUser(db);
    expect(await outcome(requestPasswordReset(db, { email: other.email }, address, mail))).toBe(
      "rate-limited:reset",
    );
  });
});

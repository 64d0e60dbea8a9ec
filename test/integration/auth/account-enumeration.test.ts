import { eq } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";

import { users } from "@/db/schema/users";
import { requestPasswordReset } from "@/lib/server/accounts/password-reset";
import { signUp } from "@/lib/server/accounts/sign-up";
import { RATE_LIMITS } from "@/lib/server/access/rate-limit";
import { inviteMember } from "@/lib/server/teams/invitations";
import { isAppError } from "@/lib/shared/errors";
import type { MailDeps } from "@/lib/shared/mail-types";

import { makeUser, openTestDb, queuedMailTo, recordingMailer, unique } from "../support/db";
import { outcome } from "../support/outcome";
import { makeTeamWithAllRoles } from "../support/team";

// A time limit, not a speed goal: sign-up hashes a password per attempt (scrypt, N = 2^17); under
// load the limit test outlasts 30 s.
vi.setConfig({ testTimeout: 120000 });

const db = openTestDb();
const PASSWORD = "twelve chars or more";

/** A mail transport that must not be used while a request is being answered. */
function untouchableMailer(): MailDeps & { calls: number; woken: number } {
  const deps = {
    calls: 0,
    woken: 0,
    appUrl: "http://app.test",
    mailer: {
      async send() {
        deps.calls++;
        throw new Error("mail sent inline, before the answer");
      },
    },
    wakeOutbox: () => {
      deps.woken++;
    },
  };
  return deps;
}

async function messageOf(promise: Promise<unknown>): Promise<string> {
  try {
    await promise;
  } catch (error) {
    if (isAppError(error)) return error.message;
    throw error;
  }
  throw new Error("expected the call to be refused");
}

describe("item 5: account enumeration and mail to anyone", () => {
  it("sign-up answers the same for a known and an unknown address; the owner is told", async () => {
    const owner = await makeUser(db, { name: "Owner of the address" });
    const fresh = `${unique("fresh")}@test.craquelure.local`;
    const known = untouchableMailer();
    const unknown = untouchableMailer();
    // Today's code refuses the known one with "exists already" (conflict:email).
    expect(
      await outcome(
        signUp(db, { name: "Eve", email: owner.email, password: PASSWORD }, unique("ip"), known),
      ),
    ).toBeNull();
    expect(
      await outcome(
        signUp(db, { name: "Eve", email: fresh, password: PASSWORD }, unique("ip"), unknown),
      ),
    ).toBeNull();
    // Nothing was sent inline either way; one mail is queued either way.
    expect([known.calls, unknown.calls]).toEqual([0, 0]);
    expect([known.woken, unknown.woken]).toEqual([1, 1]);
    const toOwner = await queuedMailTo(db, owner.email);
    expect(toOwner).toHaveLength(1);
    expect(toOwner[0].text).toMatch(/Someone tried to create a Craquelure account/);
    expect(toOwner[0].text).not.toContain("/verify/");
    expect(await queuedMailTo(db, fresh)).toHaveLength(1);
    // The account is untouched.
    const [row] = await db.select().from(users).where(eq(users.email, owner.email));
    expect(row.name).toBe("Owner of the address");
  });

  it("a reset request answers without sending inline: the mail waits in the outbox", async () => {
    const user = await makeUser(db);
    const ghost = `${unique("ghost")}@test.craquelure.local`;
    const forKnown = untouchableMailer();
    const forGhost = untouchableMailer();
    // Today's code sends the known address's mail inline (through the throwing transport).
    expect(
      await outcome(requestPasswordReset(db, { email: user.email }, unique("ip"), forKnown)),
    ).toBeNull();
    expect(
      await outcome(requestPasswordReset(db, { email: ghost }, unique("ip"), forGhost)),
    ).toBeNull();
    expect([forKnown.calls, forGhost.calls]).toEqual([0, 0]);
    const queued = await queuedMailTo(db, user.email);
    expect(queued).toHaveLength(1);
    expect(queued[0].text).toContain("http://app.test/reset/");
    expect(await queuedMailTo(db, ghost)).toHaveLength(0);
  });

  it("sign-up is limited per address typed and per client address, saying when to try again", async () => {
    const email = `${unique("target")}@test.craquelure.local`;
    for (let i = 0; i < RATE_LIMITS.signUpAccount.limit; i++) {
      await signUp(db, { name: "A", email, password: PASSWORD }, unique("ip"), recordingMailer());
    }
    const refused = signUp(
      db,
      { name: "A", email, password: PASSWORD },
      unique("ip"),
      recordingMailer(),
    );
    expect(await messageOf(refused)).toMatch(/wait \d+ minutes? and try again/);
    expect(await queuedMailTo(db, email)).toHaveLength(RATE_LIMITS.signUpAccount.limit);

    const address = unique("ip");
    for (let i = 0; i < RATE_LIMITS.signUpAddress.limit; i++) {
      const other = `${unique("spray")}@test.craquelure.local`;
      await signUp(db, { name: "A", email: other, password: PASSWORD }, address, recordingMailer());
    }
    const victim = `${unique("victim")}@test.craquelure.local`;
    expect(
      await outcome(
        signUp(db, { name: "A", email: victim, password: PASSWORD }, address, recordingMailer()),
      ),
    ).toBe("rate-limited:sign-up");
    expect(await queuedMailTo(db, victim)).toHaveLength(0);
  });

  it("invitations are limited per inviter and per invited address, saying when to try again", async () => {
    const t = await makeTeamWithAllRoles(db);
    const invite = (email: string, team = t) =>
      inviteMember(
        db,
        team.members.owner,
        { teamSlug: team.slug, email, role: "viewer" },
        recordingMailer(),
      );
    for (let i = 0; i < RATE_LIMITS.invitationActor.limit; i++) {
      await invite(`${unique("guest")}@test.craquelure.local`);
    }
    const refused = invite(`${unique("guest")}@test.craquelure.local`);
    expect(await messageOf(refused)).toMatch(/wait \d+ minutes? and try again/);

    // One address mailed from many teams: capped too.
    const target = `${unique("target")}@test.craquelure.local`;
    for (let i = 0; i < RATE_LIMITS.invitationEmail.limit; i++) {
      await invite(target, await makeTeamWithAllRoles(db));
    }
    expect(await outcome(invite(target, await makeTeamWithAllRoles(db)))).toBe(
      "rate-limited:invitation",
    );
  });
});

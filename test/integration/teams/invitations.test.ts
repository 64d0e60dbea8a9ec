import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { auditEvents } from "@/db/schema/audit-events";
import { invitations } from "@/db/schema/invitations";
import { acceptInvitation } from "@/lib/server/teams/accept-invitation";
import { inviteMember } from "@/lib/server/teams/invitations";
import { revokeInvitation } from "@/lib/server/teams/revoke-invitation";

import { makeUser, openTestDb, recordingMailer, tokenFromLink } from "../support/db";
import { failedField, outcome } from "../support/outcome";
import { makeTeamWithAllRoles, roleOf, type TeamFixture } from "../support/team";

const db = openTestDb();

async function invite(t: TeamFixture, email: string, role: string = "reviewer") {
  const mail = recordingMailer();
  const invitation = await inviteMember(
    db,
    t.members.owner,
    { teamSlug: t.slug, email, role },
    mail,
  );
  return { invitation, token: tokenFromLink(mail.sent[0], "/invite"), mail };
}

describe("invitations", () => {
  it("lets the invited, confirmed person join with the invited role, once", async () => {
    const t = await makeTeamWithAllRoles(db);
    const guest = await makeUser(db);
    const { token, mail } = await invite(t, guest.email.toUpperCase(), "reviewer");
    expect(mail.sent[0].to).toBe(guest.email);
    const team = await acceptInvitation(db, guest, token);
    expect(team.slug).toBe(t.slug);
    expect(await roleOf(db, t.teamId, guest.id)).toBe("reviewer");
    expect(await outcome(acceptInvitation(db, guest, token))).toBe("used:invitation");
    const trail = await db.select().from(auditEvents).where(eq(auditEvents.teamId, t.teamId));
    expect(trail.map((e) => e.action)).toEqual(
      expect.arrayContaining(["invitation.create", "invitation.accept"]),
    );
  });

  it("refuses someone signed in with another address, and the invitation stays open", async () => {
    const t = await makeTeamWithAllRoles(db);
    const guest = await makeUser(db);
    const intruder = await makeUser(db);
    const { token } = await invite(t, guest.email);
    expect(await outcome(acceptInvitation(db, intruder, token))).toBe("forbidden:invitation");
    expect(await roleOf(db, t.teamId, intruder.id)).toBeNull();
    expect(await outcome(acceptInvitation(db, guest, token))).toBeNull();
  });

  it("refuses an anonymous visitor and an unconfirmed account", async () => {
    const t = await makeTeamWithAllRoles(db);
    const unconfirmed = await makeUser(db, { verified: false });
    const { token } = await invite(t, unconfirmed.email);
    expect(await outcome(acceptInvitation(db, null, token))).toBe("unauthenticated");
    expect(await outcome(acceptInvitation(db, unconfirmed, token))).toBe("unverified");
    expect(await roleOf(db, t.teamId, unconfirmed.id)).toBeNull();
  });

  it("refuses an invitation older than 7 days", async () => {
    const t = await makeTeamWithAllRoles(db);
    const guest = await makeUser(db);
    const { token } = await invite(t, guest.email);
    const later = new Date(Date.now() + 8 * 24 * 3600_000);
    expect(await outcome(acceptInvitation(db, guest, token, later))).toBe("expired:invitation");
    expect(await roleOf(db, t.teamId, guest.id)).toBeNull();
  });

  it("refuses a withdrawn invitation and one replaced by a newer invitation", async () => {
    const t = await makeTeamWithAllRoles(db);
    const guest = await makeUser(db);
    const first = await invite(t, guest.email, "viewer");
    const second = await invite(t, guest.email, "editor");
    expect(await outcome(acceptInvitation(db, guest, first.token))).toBe("used:invitation");
    await revokeInvitation(db, t.members.owner, {
      teamSlug: t.slug,
      invitationId: second.invitation.id,
    });
    expect(await outcome(acceptInvitation(db, guest, second.token))).toBe("used:invitation");
    expect(await roleOf(db, t.teamId, guest.id)).toBeNull();
  });

  it("refuses inviting a current member, an unknown role, and a malformed address, beside the field", async () => {
    const t = await makeTeamWithAllRoles(db);
    const owner = t.members.owner;
    const mail = recordingMailer();
    const member = inviteMember(
      db,
      owner,
      { teamSlug: t.slug, email: t.members.viewer.email, role: "editor" },
      mail,
    );
    expect(await failedField(member)).toBe("email");
    const forgedRole = inviteMember(
      db,
      owner,
      { teamSlug: t.slug, email: "x@test.craquelure.local", role: "admin" },
      mail,
    );
    expect(await failedField(forgedRole)).toBe("role");
    const badEmail = inviteMember(
      db,
      owner,
      { teamSlug: t.slug, email: "nobody", role: "viewer" },
      mail,
    );
    expect(await failedField(badEmail)).toBe("email");
    expect(mail.sent).toHaveLength(0);
    expect(
      await db.select().from(invitations).where(eq(invitations.teamId, t.teamId)),
    ).toHaveLength(0);
  });

  it("refuses an unknown team and a team the inviter does not belong to alike", async () => {
    const t = await makeTeamWithAllRoles(db);
    const other = await makeTeamWithAllRoles(db);
    const mail = recordingMailer();
    const args = { email: "someone@test.craquelure.local", role: "viewer" };
    expect(
      await outcome(
        inviteMember(db, t.members.owner, { ...args, teamSlug: "no-such-team-anywhere" }, mail),
      ),
    ).toBe("not-found:team");
    expect(
      await outcome(inviteMember(db, t.members.owner, { ...args, teamSlug: other.slug }, mail)),
    ).toBe("not-found:team");
    // An invitation id of another team cannot be withdrawn through one's own team.
    const { invitation } = await invite(other, "guest@test.craquelure.local");
    const forged = revokeInvitation(db, t.members.owner, {
      teamSlug: t.slug,
      invitationId: invitation.id,
    });
    expect(await outcome(forged)).toBe("not-found:invitation");
  });

  it("refuses malformed and unknown tokens", async () => {
    const guest = await makeUser(db);
    expect(await outcome(acceptInvitation(db, guest, "nope"))).toBe("not-found:invitation");
    expect(await outcome(acceptInvitation(db, guest, "B".repeat(43)))).toBe("not-found:invitation");
  });
});

import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { auditEvents } from "@/db/schema/audit-events";
import { memberships, teams } from "@/db/schema/teams";
import { createTeam } from "@/lib/server/teams/create";
import { changeMemberRole, leaveTeam, removeMember } from "@/lib/server/teams/members";
import { deleteTeam, renameTeam } from "@/lib/server/teams/settings";

import { makeUser, openTestDb, unique } from "../support/db";
import { failedField, outcome } from "../support/outcome";
import { makeTeamWithAllRoles, roleOf } from "../support/team";

const db = openTestDb();

describe("creating a team", () => {
  it("makes the founder its owner and records it", async () => {
    const founder = await makeUser(db);
    const team = await createTeam(db, founder, { name: "Crash lab" });
    expect(team.slug).toMatch(/^crash-lab/);
    expect(await roleOf(db, team.id, founder.id)).toBe("owner");
    const trail = await db.select().from(auditEvents).where(eq(auditEvents.teamId, team.id));
    expect(trail.map((e) => [e.action, e.actorId])).toEqual([["team.create", founder.id]]);
  });

  it("gives a second team of the same name its own slug", async () => {
    const name = unique("Same name");
    const a = await createTeam(db, await makeUser(db), { name });
    const b = await createTeam(db, await makeUser(db), { name });
    expect(a.slug).not.toBe(b.slug);
  });

  it("refuses anonymous and unconfirmed founders and a too-short name", async () => {
    expect(await outcome(createTeam(db, null, { name: "Crash lab" }))).toBe("unauthenticated");
    expect(
      await outcome(createTeam(db, await makeUser(db, { verified: false }), { name: "Crash lab" })),
    ).toBe("unverified");
    expect(await failedField(createTeam(db, await makeUser(db), { name: " x " }))).toBe("name");
  });
});

describe("the last owner", () => {
  it("cannot leave or step down; nothing changes", async () => {
    const t = await makeTeamWithAllRoles(db);
    const owner = t.members.owner;
    expect(await outcome(leaveTeam(db, owner, { teamSlug: t.slug }))).toBe("conflict:last-owner");
    const demote = changeMemberRole(db, owner, {
      teamSlug: t.slug,
      userId: owner.id,
      role: "editor",
    });
    expect(await outcome(demote)).toBe("conflict:last-owner");
    expect(await outcome(removeMember(db, owner, { teamSlug: t.slug, userId: owner.id }))).toBe(
      "conflict:last-owner",
    );
    expect(await roleOf(db, t.teamId, owner.id)).toBe("owner");
  });

  it("can step down or leave once another owner exists", async () => {
    const t = await makeTeamWithAllRoles(db);
    const { owner, editor } = t.members;
    await changeMemberRole(db, owner, { teamSlug: t.slug, userId: editor.id, role: "owner" });
    await changeMemberRole(db, owner, { teamSlug: t.slug, userId: owner.id, role: "viewer" });
    expect(await roleOf(db, t.teamId, owner.id)).toBe("viewer");
    await leaveTeam(db, owner, { teamSlug: t.slug });
    expect(await roleOf(db, t.teamId, owner.id)).toBeNull();
    // The new sole owner is now the last one.
    expect(await outcome(leaveTeam(db, editor, { teamSlug: t.slug }))).toBe("conflict:last-owner");
  });
});

describe("members", () => {
  it("may leave whatever their role", async () => {
    const t = await makeTeamWithAllRoles(db);
    for (const role of ["editor", "reviewer", "viewer"] as const) {
      await leaveTeam(db, t.members[role], { teamSlug: t.slug });
      expect(await roleOf(db, t.teamId, t.members[role].id)).toBeNull();
    }
    expect(await outcome(leaveTeam(db, t.outsider, { teamSlug: t.slug }))).toBe("not-found:team");
  });

  it("changing and removing write audit events with before and after", async () => {
    const t = await makeTeamWithAllRoles(db);
    const { owner, viewer, reviewer } = t.members;
    await changeMemberRole(db, owner, { teamSlug: t.slug, userId: viewer.id, role: "editor" });
    await removeMember(db, owner, { teamSlug: t.slug, userId: reviewer.id });
    const trail = await db.select().from(auditEvents).where(eq(auditEvents.teamId, t.teamId));
    const change = trail.find((e) => e.action === "member.change-role");
    expect(change?.detail).toEqual({ from: "viewer", to: "editor" });
    expect(trail.find((e) => e.action === "member.remove")?.target).toBe(reviewer.id);
  });

  it("refuses a forged role or member id, and a member of another team, changing nothing", async () => {
    const t = await makeTeamWithAllRoles(db);
    const other = await makeTeamWithAllRoles(db);
    const { owner, viewer } = t.members;
    expect(
      await failedField(
        changeMemberRole(db, owner, { teamSlug: t.slug, userId: viewer.id, role: "admin" }),
      ),
    ).toBe("role");
    expect(
      await outcome(
        changeMemberRole(db, owner, { teamSlug: t.slug, userId: "not-a-uuid", role: "editor" }),
      ),
    ).toBe("invalid:userId");
    const foreign = changeMemberRole(db, owner, {
      teamSlug: t.slug,
      userId: other.members.viewer.id,
      role: "editor",
    });
    expect(await outcome(foreign)).toBe("not-found:member");
    expect(
      await outcome(removeMember(db, owner, { teamSlug: t.slug, userId: other.members.viewer.id })),
    ).toBe("not-found:member");
    expect(await roleOf(db, t.teamId, viewer.id)).toBe("viewer");
    expect(await roleOf(db, other.teamId, other.members.viewer.id)).toBe("viewer");
  });
});

describe("team settings", () => {
  it("renaming keeps the slug; deleting needs the slug typed and keeps the audit trail", async () => {
    const t = await makeTeamWithAllRoles(db);
    const renamed = await renameTeam(db, t.members.owner, { teamSlug: t.slug, name: "New name" });
    expect(renamed.slug).toBe(t.slug);
    expect(
      await failedField(deleteTeam(db, t.members.owner, { teamSlug: t.slug, confirm: "wrong" })),
    ).toBe("confirm");
    expect(await db.select().from(teams).where(eq(teams.id, t.teamId))).toHaveLength(1);
    await deleteTeam(db, t.members.owner, { teamSlug: t.slug, confirm: t.slug });
    expect(
      await db.select().from(memberships).where(eq(memberships.teamId, t.teamId)),
    ).toHaveLength(0);
    const trail = await db.select().from(auditEvents).where(eq(auditEvents.target, t.slug));
    const deleted = trail.find((e) => e.action === "team.delete");
    expect(deleted?.actorId).toBe(t.members.owner.id);
    expect(deleted?.detail).toMatchObject({ slug: t.slug, name: "New name" });
  });
});

import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";

import { invitations } from "@/db/schema/invitations";
import { teams } from "@/db/schema/teams";
import type { Actor } from "@/lib/server/accounts/actor";
import { inviteMember } from "@/lib/server/teams/invitations";
import { changeMemberRole, removeMember } from "@/lib/server/teams/members";
import { deleteTeam, renameTeam } from "@/lib/server/teams/settings";

import { openTestDb, recordingMailer } from "../support/db";
import { outcome } from "../support/outcome";
import { makeTeamWithAllRoles, roleOf, type TeamFixture } from "../support/team";

const db = openTestDb();

type ActorKind = "owner" | "editor" | "reviewer" | "viewer" | "outsider" | "anonymous";
const ACTORS: ActorKind[] = ["owner", "editor", "reviewer", "viewer", "outsider", "anonymous"];

function actorFor(kind: ActorKind, t: TeamFixture): Actor {
  if (kind === "anonymous") return null;
  if (kind === "outsider") return t.outsider;
  return t.members[kind];
}

// Written out by hand from product.md's role table (owner: members, roles, deleting the team),
// not derived from lib/shared/permissions.ts, so a wrong table fails here.
const EXPECTED_DENIAL: Record<ActorKind, string | null> = {
  owner: null,
  editor: "forbidden:team",
  reviewer: "forbidden:team",
  viewer: "forbidden:team",
  outsider: "not-found:team",
  anonymous: "unauthenticated",
};

interface TeamAction {
  run: (actor: Actor, t: TeamFixture) => Promise<unknown>;
  /** Reads back whether the action's effect happened. */
  happened: (t: TeamFixture) => Promise<boolean>;
}

const ACTIONS: Record<string, TeamAction> = {
  invite: {
    run: (actor, t) =>
      inviteMember(
        db,
        actor,
        { teamSlug: t.slug, email: `new-${t.slug}@test.craquelure.local`, role: "viewer" },
        recordingMailer(),
      ),
    happened: async (t) =>
      (await db.select().from(invitations).where(eq(invitations.teamId, t.teamId))).length > 0,
  },
  "change role": {
    run: (actor, t) =>
      changeMemberRole(db, actor, {
        teamSlug: t.slug,
        userId: t.members.viewer.id,
        role: "editor",
      }),
    happened: async (t) => (await roleOf(db, t.teamId, t.members.viewer.id)) === "editor",
  },
  remove: {
    run: (actor, t) => removeMember(db, actor, { teamSlug: t.slug, userId: t.members.reviewer.id }),
    happened: async (t) => (await roleOf(db, t.teamId, t.members.reviewer.id)) === null,
  },
  rename: {
    run: (actor, t) => renameTeam(db, actor, { teamSlug: t.slug, name: "Renamed team" }),
    happened: async (t) =>
      (await db.select().from(teams).where(eq(teams.id, t.teamId)))[0]?.name === "Renamed team",
  },
  "delete team": {
    run: (actor, t) => deleteTeam(db, actor, { teamSlug: t.slug, confirm: t.slug }),
    happened: async (t) =>
      (await db.select().from(teams).where(eq(teams.id, t.teamId))).length === 0,
  },
};

describe("each actor against each team action", () => {
  for (const [name, action] of Object.entries(ACTIONS)) {
    for (const kind of ACTORS) {
      const denial = EXPECTED_DENIAL[kind];
      it(`${name} by ${kind} is ${denial ? `refused (${denial})` : "allowed"}`, async () => {
        const t = await makeTeamWithAllRoles(db);
        expect(await action.happened(t)).toBe(false);
        expect(await outcome(action.run(actorFor(kind, t), t))).toBe(denial);
        expect(await action.happened(t)).toBe(denial === null);
      });
    }
  }
});

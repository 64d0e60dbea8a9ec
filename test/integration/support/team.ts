import { eq } from "drizzle-orm";

import type { Db } from "@/db/client";
import { memberships } from "@/db/schema/teams";
import type { SignedInActor } from "@/lib/server/accounts/actor";
import type { Role } from "@/lib/shared/permissions";
import { createTeam } from "@/lib/server/teams/create";

import { makeUser, unique } from "./db";

export interface TeamFixture {
  slug: string;
  teamId: string;
  members: Record<Role, SignedInActor>;
  /** A confirmed user who belongs to a different team only. */
  outsider: SignedInActor;
}

/** A fresh team with one member per role, plus an outsider who owns another team. */
export async function makeTeamWithAllRoles(db: Db): Promise<TeamFixture> {
  const owner = await makeUser(db, { name: "Owner" });
  const team = await createTeam(db, owner, { name: unique("Team") });
  const members = { owner } as Record<Role, SignedInActor>;
  for (const role of ["editor", "reviewer", "viewer"] as const) {
    const user = await makeUser(db, { name: role });
    await db.insert(memberships).values({ teamId: team.id, userId: user.id, role });
    members[role] = user;
  }
  const outsider = await makeUser(db, { name: "Outsider" });
  await createTeam(db, outsider, { name: unique("Other team") });
  return { slug: team.slug, teamId: team.id, members, outsider };
}

export async function roleOf(db: Db, teamId: string, userId: string): Promise<Role | null> {
  const rows = await db.select().from(memberships).where(eq(memberships.teamId, teamId));
  return rows.find((r) => r.userId === userId)?.role ?? null;
}

import "server-only";

import type { Db, Executor } from "@/db/client";
import { revokeApiTokensOfUser } from "@/db/queries/api-tokens";
import {
  countOwners,
  deleteMembership,
  findMembership,
  lockTeamRow,
  setMemberRole,
} from "@/db/queries/memberships";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { canGrant, ROLE_LABELS, type Role } from "@/lib/shared/permissions";
import { AppError } from "@/lib/shared/errors";
import { changeRoleSchema, memberSchema, teamRefSchema } from "@/lib/shared/validations/teams";
import { parseInput } from "@/lib/shared/validations/parse";

import { authorizeTeam, type TeamContext } from "../access/team-access";

const LAST_OWNER = "A team needs at least one owner. Make another member owner first.";

/** Locks the team row so two concurrent demotions cannot both see "another owner is left". */
async function lockTeamAndCountOwners(tx: Executor, teamId: string): Promise<number> {
  await lockTeamRow(tx, teamId);
  return countOwners(tx, teamId);
}

async function findMember(tx: Executor, teamId: string, userId: string) {
  const row = await findMembership(tx, teamId, userId);
  if (!row) throw new AppError("not-found:member", "That person is not a member of this team.");
  return row;
}

/** Only roles the actor may grant can be given, and only to members holding such a role. */
function assertMayManage(ctx: TeamContext, current: Role, next?: Role) {
  const role = next ?? current;
  if (!canGrant(ctx.role, current) || !canGrant(ctx.role, role)) {
    throw new AppError(
      "forbidden:role",
      `As ${ROLE_LABELS[ctx.role].toLowerCase()} you may not give or take the role ${ROLE_LABELS[role].toLowerCase()}.`,
      "role",
    );
  }
}

export async function changeMemberRole(db: Db, actor: Actor, input: unknown): Promise<void> {
  const data = parseInput(changeRoleSchema, input);
  const ctx = await authorizeTeam(db, actor, data.teamSlug, "member:change-role");
  await db.transaction(async (tx) => {
    const owners = await lockTeamAndCountOwners(tx, ctx.team.id);
    const member = await findMember(tx, ctx.team.id, data.userId);
    assertMayManage(ctx, member.role, data.role);
    if (member.role === data.role) return;
    if (member.role === "owner" && owners <= 1)
      throw new AppError("conflict:last-owner", LAST_OWNER, "role");
    await setMemberRole(tx, ctx.team.id, data.userId, data.role);
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "member.change-role",
      target: data.userId,
      detail: { from: member.role, to: data.role },
    });
  });
}

export async function removeMember(db: Db, actor: Actor, input: unknown): Promise<void> {
  const data = parseInput(memberSchema, input);
  const ctx = await authorizeTeam(db, actor, data.teamSlug, "member:remove");
  if (data.userId === ctx.actor.id) return leaveTeam(db, actor, { teamSlug: data.teamSlug });
  await db.transaction(async (tx) => {
    const owners = await lockTeamAndCountOwners(tx, ctx.team.id);
    const member = await findMember(tx, ctx.team.id, data.userId);
    assertMayManage(ctx, member.role);
    if (member.role === "owner" && owners <= 1)
      throw new AppError("conflict:last-owner", LAST_OWNER);
    await deleteMembership(tx, ctx.team.id, data.userId);
    await revokeApiTokensOfUser(tx, data.userId, new Date(), ctx.team.id);
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "member.remove",
      target: data.userId,
      detail: { role: member.role },
    });
  });
}

/** Any member may leave, except the last owner (who must hand over or delete the team). */
export async function leaveTeam(db: Db, actor: Actor, input: unknown): Promise<void> {
  const data = parseInput(teamRefSchema, input);
  const ctx = await authorizeTeam(db, actor, data.teamSlug, "team:read");
  await db.transaction(async (tx) => {
    const owners = await lockTeamAndCountOwners(tx, ctx.team.id);
    const member = await findMember(tx, ctx.team.id, ctx.actor.id);
    if (member.role === "owner" && owners <= 1)
      throw new AppError("conflict:last-owner", LAST_OWNER);
    await deleteMembership(tx, ctx.team.id, ctx.actor.id);
    await revokeApiTokensOfUser(tx, ctx.actor.id, new Date(), ctx.team.id);
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "member.leave",
      target: ctx.actor.id,
      detail: { role: member.role },
    });
  });
}

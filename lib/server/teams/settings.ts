import "server-only";

import type { Db } from "@/db/client";
import { deleteTeamRow, renameTeamRow } from "@/db/queries/teams";
import type { Team } from "@/db/schema/teams";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { AppError } from "@/lib/shared/errors";
import { deleteTeamSchema, renameTeamSchema } from "@/lib/shared/validations/teams";
import { parseInput } from "@/lib/shared/validations/parse";

import { authorizeTeam } from "../access/team-access";

/** Renames; the slug (and so every link to the team) stays. */
export async function renameTeam(db: Db, actor: Actor, input: unknown): Promise<Team> {
  const data = parseInput(renameTeamSchema, input);
  const ctx = await authorizeTeam(db, actor, data.teamSlug, "team:rename");
  return db.transaction(async (tx) => {
    const team = await renameTeamRow(tx, ctx.team.id, data.name);
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: team.id,
      action: "team.rename",
      target: team.slug,
      detail: { from: ctx.team.name, to: data.name },
    });
    return team;
  });
}

/** Deletes the team and, by cascade, its memberships and invitations; the audit trail stays. */
export async function deleteTeam(db: Db, actor: Actor, input: unknown): Promise<void> {
  const data = parseInput(deleteTeamSchema, input);
  const ctx = await authorizeTeam(db, actor, data.teamSlug, "team:delete");
  if (data.confirm !== ctx.team.slug) {
    throw new AppError("invalid:confirm", `Type ${ctx.team.slug} to confirm.`, "confirm");
  }
  await db.transaction(async (tx) => {
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "team.delete",
      target: ctx.team.slug,
      detail: { name: ctx.team.name, slug: ctx.team.slug },
    });
    await deleteTeamRow(tx, ctx.team.id);
  });
}

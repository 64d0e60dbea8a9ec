import "server-only";

import type { Db } from "@/db/client";
import { insertMembership } from "@/db/queries/memberships";
import { insertTeam } from "@/db/queries/teams";
import type { Team } from "@/db/schema/teams";
import type { Actor } from "@/lib/server/accounts/actor";
import { isUniqueViolation } from "@/lib/server/accounts/pg-errors";
import { recordAudit } from "@/lib/server/access/audit";
import { createTeamSchema } from "@/lib/shared/validations/teams";
import { parseInput } from "@/lib/shared/validations/parse";

import { requireVerified } from "../access/team-access";
import { slugify, slugWithSuffix } from "./slug";

/** Any confirmed user may found a team and becomes its owner. */
export async function createTeam(db: Db, actor: Actor, input: unknown): Promise<Team> {
  const founder = requireVerified(actor);
  const { name } = parseInput(createTeamSchema, input);
  const base = slugify(name);
  // Try the plain slug, then a few random tails; the unique index is the arbiter.
  for (const slug of [base, slugWithSuffix(base), slugWithSuffix(base), slugWithSuffix(base)]) {
    try {
      return await db.transaction(async (tx) => {
        const team = await insertTeam(tx, { slug, name });
        await insertMembership(tx, { teamId: team.id, userId: founder.id, role: "owner" });
        await recordAudit(tx, {
          actorId: founder.id,
          teamId: team.id,
          action: "team.create",
          target: slug,
          detail: { name },
        });
        return team;
      });
    } catch (error) {
      if (!isUniqueViolation(error)) throw error;
    }
  }
  throw new Error(`could not find a free slug for ${base}`);
}

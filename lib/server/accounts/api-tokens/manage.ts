import "server-only";

/**
 * Personal API tokens, managed by their owner from the account page. A token is bound to one
 * team and carries a role no higher than the owner's role there at creation; at every use the
 * lower of that role and the owner's current role counts (see authenticate.ts).
 */
import type { Executor } from "@/db/client";
import { insertApiToken, listApiTokensOfUser, revokeApiTokenOfUser } from "@/db/queries/api-tokens";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { ROLE_LABELS } from "@/lib/shared/permissions";
import { AppError } from "@/lib/shared/errors";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { requireUuid } from "@/lib/server/workspace/errors";
import { parseWithPath } from "@/lib/server/workspace/parse";

import { roleWithin } from "../../../shared/token-roles";
import { createApiTokenSchema } from "./schema";
import { newApiToken } from "./secret";

function requireActor(actor: Actor) {
  if (!actor) throw new AppError("unauthenticated", "Please sign in first.");
  return actor;
}

/** Returns the secret once; only its hash is stored. */
export async function createApiToken(db: Executor, actor: Actor, input: unknown) {
  const data = parseWithPath(createApiTokenSchema, input);
  const ctx = await authorizeTeam(db, requireActor(actor), data.team, "team:read");
  if (!roleWithin(data.role, ctx.role)) {
    throw new AppError(
      "forbidden:token-role",
      `As ${ROLE_LABELS[ctx.role].toLowerCase()} of this team you cannot give a token the ${ROLE_LABELS[data.role].toLowerCase()} role.`,
      "role",
    );
  }
  const secret = newApiToken();
  const row = await insertApiToken(db, {
    userId: ctx.actor.id,
    teamId: ctx.team.id,
    name: data.name,
    role: data.role,
    tokenHash: secret.hash,
    prefix: secret.prefix,
  });
  await recordAudit(db, {
    actorId: ctx.actor.id,
    teamId: ctx.team.id,
    action: "api-token.create",
    target: row.id,
    detail: { name: data.name, role: data.role },
  });
  return { id: row.id, token: secret.token, name: row.name, role: row.role, team: ctx.team.slug };
}

export async function listApiTokens(db: Executor, actor: Actor) {
  return listApiTokensOfUser(db, requireActor(actor).id);
}

export async function revokeApiToken(db: Executor, actor: Actor, tokenId: unknown) {
  const user = requireActor(actor);
  const id = requireUuid(tokenId, "token");
  if (!(await revokeApiTokenOfUser(db, user.id, id))) {
    throw new AppError("not-found:token", "There is no such live token of yours.");
  }
  await recordAudit(db, { actorId: user.id, action: "api-token.revoke", target: id });
  return { revoked: id };
}

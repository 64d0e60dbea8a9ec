import "server-only";

/**
 * Bearer authentication for the public API. An unknown, malformed or revoked token, or one
 * whose owner has left the team, is 401. The token acts as its owner, only in the token's team,
 * and only where both its role and the owner's current role allow (roles.ts tokenCan).
 */
import type { Executor } from "@/db/client";
import { findApiTokenByHash, touchApiToken } from "@/db/queries/api-tokens";
import type { SignedInActor } from "@/lib/server/accounts/actor";
import type { Role } from "@/lib/shared/permissions";
import { AppError } from "@/lib/shared/errors";

import { hashApiToken, looksLikeApiToken } from "./secret";

export interface TokenPrincipal {
  tokenId: string;
  actor: SignedInActor;
  teamId: string;
  teamSlug: string;
  /** The token's own role. */
  role: Role;
  /** The owner's current role in the team. */
  memberRole: Role;
}

const REJECTED = "The API token is not valid: it is unknown, revoked, or its owner left the team.";

/** Last-used is written at most once a minute per token, not on every call. */
const TOUCH_EVERY_MS = 60_000;

export async function authenticateToken(
  db: Executor,
  token: string,
  now: Date = new Date(),
): Promise<TokenPrincipal> {
  if (!looksLikeApiToken(token)) throw new AppError("unauthenticated", REJECTED);
  const found = await findApiTokenByHash(db, hashApiToken(token));
  if (!found || found.token.revokedAt || !found.memberRole) {
    throw new AppError("unauthenticated", REJECTED);
  }
  const last = found.token.lastUsedAt?.getTime() ?? 0;
  if (now.getTime() - last > TOUCH_EVERY_MS) await touchApiToken(db, found.token.id, now);
  return {
    tokenId: found.token.id,
    actor: found.user,
    teamId: found.token.teamId,
    teamSlug: found.teamSlug,
    role: found.token.role,
    memberRole: found.memberRole,
  };
}

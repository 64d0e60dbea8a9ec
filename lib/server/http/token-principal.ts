import "server-only";

import type { Db } from "@/db/client";
import { authenticateToken } from "@/lib/server/accounts/api-tokens/authenticate";
import { bearerOf } from "@/lib/server/accounts/api-tokens/secret";
import { NOT_FOUND_MESSAGE } from "@/lib/server/access/team-access";
import { AppError } from "@/lib/shared/errors";
import type { Capability } from "@/lib/shared/permissions";
import { tokenCan } from "@/lib/shared/token-roles";

/**
 * The token behind `Authorization: Bearer …`, or null without one. A token of another team than
 * the URL's answers 404 (as a team the caller is not in), a token whose role lacks the
 * capability 403.
 */
export async function tokenPrincipalOf(
  db: Db,
  request: Request,
  team: string | undefined,
  capability: Capability,
) {
  const bearer = bearerOf(request);
  if (bearer === null) return null;
  const principal = await authenticateToken(db, bearer);
  if (team !== undefined && team !== principal.teamSlug) {
    throw new AppError("not-found:team", NOT_FOUND_MESSAGE);
  }
  if (!tokenCan(principal.role, principal.memberRole, capability)) {
    throw new AppError("forbidden:token", `This token's role (${principal.role}) may not do that.`);
  }
  return principal;
}

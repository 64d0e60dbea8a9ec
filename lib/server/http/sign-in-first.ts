import "server-only";

import type { Actor } from "@/lib/server/accounts/actor";
import { AppError } from "@/lib/shared/errors";

const BODY_METHODS = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/**
 * Every write in /api/v1 needs a signed-in user or a token. Refusing an anonymous one here,
 * before the handler reads the body, keeps strangers from making the server read up to the
 * route's body limit (64 MB on import) only to answer 401.
 */
export function refuseAnonymousWrite(request: Request, actor: Actor): void {
  if (!actor && BODY_METHODS.has(request.method.toUpperCase())) {
    throw new AppError("unauthenticated", "Please sign in first.");
  }
}

import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { tokenRoute } from "@/lib/server/http/route";
import { AppError } from "@/lib/shared/errors";
import { computeOrientation } from "@/lib/server/handoff/orientation/compute";

/** In-plane stiffness and damage frame of a layer stack from its orientation tensors (spec A.5). */
export const POST = tokenRoute(
  "team:read",
  async ({ request, actor }) => {
    if (!actor) throw new AppError("unauthenticated", "Send a Bearer token or sign in first.");
    return computeOrientation(await readJsonBody(request, BODY_LIMITS.small));
  },
  { limitSessions: true },
);

import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute, Created } from "@/lib/server/http/route";
import { createShareLink } from "@/lib/server/workspace/share-links";

type Params = { team: string; scenario: string; number: string };

/** share:create; body { expiresInDays? = 14 } → 201 CreateShareLinkResponse (token shown once). */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.small, { optional: true });
  return new Created(
    await createShareLink(db, actor, params.team, params.scenario, params.number, body),
  );
});

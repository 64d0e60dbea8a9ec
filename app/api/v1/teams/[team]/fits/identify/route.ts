import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute } from "@/lib/server/http/route";
import { identifyRecords } from "@/lib/server/records/identify-records";

type Params = { team: string };

/** fit:run; body IdentifyRequest → IdentifyResponse (nothing is saved). */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.small);
  return identifyRecords(db, actor, params.team, body);
});

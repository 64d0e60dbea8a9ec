import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute, Created } from "@/lib/server/http/route";
import { listFits } from "@/lib/server/records/fits";
import { saveFit } from "@/lib/server/records/save-fit";

type Params = { team: string };

/** team:read → FitListResponse (newest first). */
export const GET = apiRoute<Params>(({ db, actor, params }) => listFits(db, actor, params.team));

/** fit:run + parameter-set:edit; body SaveFitRequest → 201 { id, parameterSetId, residuals }. */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.small);
  return new Created(await saveFit(db, actor, params.team, body));
});

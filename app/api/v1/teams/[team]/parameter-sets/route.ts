import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute, Created } from "@/lib/server/http/route";
import { createParameterSet, listParameterSets } from "@/lib/server/workspace/parameter-sets";

type Params = { team: string };

/** team:read → ParameterSetListResponse (by name). */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  listParameterSets(db, actor, params.team),
);

/** parameter-set:edit; body CreateParameterSetInput → 201 ParameterSetResponse. */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.small);
  return new Created(await createParameterSet(db, actor, params.team, body));
});

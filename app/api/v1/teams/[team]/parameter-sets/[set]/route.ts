import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute } from "@/lib/server/http/route";
import {
  deleteParameterSet,
  getParameterSet,
  updateParameterSet,
} from "@/lib/server/workspace/parameter-sets";

type Params = { team: string; set: string };

/** team:read → ParameterSetResponse. */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  getParameterSet(db, actor, params.team, params.set),
);

/** parameter-set:edit; body UpdateParameterSetInput → ParameterSetResponse. */
export const PATCH = apiRoute<Params>(async ({ db, actor, params, request }) =>
  updateParameterSet(
    db,
    actor,
    params.team,
    params.set,
    await readJsonBody(request, BODY_LIMITS.small),
  ),
);

/** parameter-set:edit → { deleted: id }. */
export const DELETE = apiRoute<Params>(({ db, actor, params }) =>
  deleteParameterSet(db, actor, params.team, params.set),
);

import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute } from "@/lib/server/http/route";
import { deleteScenario, getScenario, updateScenario } from "@/lib/server/workspace/scenarios";

type Params = { team: string; scenario: string };

/** team:read → ScenarioResponse. */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  getScenario(db, actor, params.team, params.scenario),
);

/** scenario:edit; body UpdateScenarioInput (name, materialLabel, tags) → ScenarioResponse. */
export const PATCH = apiRoute<Params>(async ({ db, actor, params, request }) =>
  updateScenario(
    db,
    actor,
    params.team,
    params.scenario,
    await readJsonBody(request, BODY_LIMITS.small),
  ),
);

/** scenario:edit → { deleted: id }. */
export const DELETE = apiRoute<Params>(({ db, actor, params }) =>
  deleteScenario(db, actor, params.team, params.scenario),
);

import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { checkApiCapsOfSavedFile } from "@/lib/server/api-caps";
import { Created, apiRoute, tokenRoute } from "@/lib/server/http/route";
import { createScenario, listScenarios } from "@/lib/server/workspace/scenarios";

type Params = { team: string };

/** team:read → ScenarioListResponse (query: sort, dir, tag, review, author, q, page, pageSize). */
// Also open to personal API tokens of this team (lib/server/http/route.ts, tokenRoute).
export const GET = tokenRoute<Params>("team:read", ({ db, actor, params, query }) =>
  listScenarios(db, actor, params.team, query),
);

/** scenario:edit; body CreateScenarioInput → 201 CreateScenarioResponse. */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.scenario);
  checkApiCapsOfSavedFile(body);
  return new Created(await createScenario(db, actor, params.team, body));
});

import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { checkApiCapsOfSavedFile } from "@/lib/server/api-caps";
import { Created, apiRoute, tokenRoute } from "@/lib/server/http/route";
import { listRevisions, saveRevision } from "@/lib/server/workspace/revisions";

type Params = { team: string; scenario: string };

/** team:read → RevisionListResponse (newest first). */
// Also open to personal API tokens of this team (lib/server/http/route.ts, tokenRoute).
export const GET = tokenRoute<Params>("team:read", ({ db, actor, params }) =>
  listRevisions(db, actor, params.team, params.scenario),
);

/**
 * scenario:edit; body SaveRevisionInput { baseRevision, message, file } → 201
 * SaveRevisionResponse, or 409 conflict:revision with `latest: { number, author, at }`.
 */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.scenario);
  checkApiCapsOfSavedFile(body);
  return new Created(await saveRevision(db, actor, params.team, params.scenario, body));
});

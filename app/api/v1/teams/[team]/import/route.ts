import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute, Created } from "@/lib/server/http/route";
import { importTeam } from "@/lib/server/workspace/import";

type Params = { team: string };

/** team:import (owners), into an empty team; body TeamExport → 201 TeamImportResponse. */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.teamImport);
  return new Created(await importTeam(db, actor, params.team, body));
});

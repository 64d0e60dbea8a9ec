import { readJsonBody } from "@/lib/server/http/body";
import { Created, tokenRoute } from "@/lib/server/http/route";
import {
  createConformanceCheck,
  listConformanceChecks,
} from "@/lib/server/handoff/conformance/service";

type Params = { team: string; scenario: string; number: string };

/** A history CSV of up to 10 MB, wrapped in JSON. */
const UPLOAD_LIMIT = 12 * 1024 * 1024;

/** team:read → { items: checks, newest first }. */
export const GET = tokenRoute<Params>("team:read", ({ db, actor, params }) =>
  listConformanceChecks(db, actor, {
    teamSlug: params.team,
    scenarioId: params.scenario,
    number: params.number,
  }),
);

/** scenario:edit; body ConformanceUpload → 201 { id, passed, firstFailIncrement, result }. */
export const POST = tokenRoute<Params>("scenario:edit", async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, UPLOAD_LIMIT);
  const ref = { teamSlug: params.team, scenarioId: params.scenario, number: params.number };
  return new Created(await createConformanceCheck(db, actor, ref, body));
});

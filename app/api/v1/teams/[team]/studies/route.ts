import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { Created, tokenRoute } from "@/lib/server/http/route";
import { getStudyQueue } from "@/lib/server/handoff/studies/app-queue";
import { submitStudy } from "@/lib/server/handoff/studies/service";

type Params = { team: string };

/** fit:run; body StudyRequest → 201 { id, total }: one queue job per parameter set. */
export const POST = tokenRoute<Params>("fit:run", async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.scenario);
  return new Created(await submitStudy(db, getStudyQueue, actor, params.team, body));
});

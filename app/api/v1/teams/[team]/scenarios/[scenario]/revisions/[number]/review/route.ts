import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute } from "@/lib/server/http/route";
import { mailDeps } from "@/lib/server/email/deps";
import { changeReview, reviewHistory } from "@/lib/server/workspace/review";

type Params = { team: string; scenario: string; number: string };

/** team:read → ReviewHistoryResponse. */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  reviewHistory(db, actor, params.team, params.scenario, params.number),
);

/**
 * body ReviewActionInput { action: request | approve | request-changes, note?, reviewers }:
 * request needs scenario:edit and `reviewers` (required: ids of the team's reviewers or owners,
 * not the requester), verdicts need review:verdict → ReviewActionResponse.
 */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) =>
  changeReview(
    db,
    actor,
    params.team,
    params.scenario,
    params.number,
    await readJsonBody(request, BODY_LIMITS.small),
    mailDeps(),
  ),
);

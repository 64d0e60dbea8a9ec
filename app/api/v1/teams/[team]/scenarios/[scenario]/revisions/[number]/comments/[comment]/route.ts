import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute } from "@/lib/server/http/route";
import { editComment } from "@/lib/server/workspace/comments";

type Params = { team: string; scenario: string; number: string; comment: string };

/** comment:write, own comments only; body { body } → CommentListResponse. */
export const PATCH = apiRoute<Params>(async ({ db, actor, params, request }) =>
  editComment(
    db,
    actor,
    params.team,
    params.scenario,
    params.number,
    params.comment,
    await readJsonBody(request, BODY_LIMITS.small),
  ),
);

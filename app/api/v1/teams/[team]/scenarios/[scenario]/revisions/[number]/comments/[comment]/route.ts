import { BODY_LIMITS, readJsonBody } from "@/lib/api/body";
import { apiRoute } from "@/lib/api/route";
import { editComment } from "@/lib/workspace/comments";

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

import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute, Created } from "@/lib/server/http/route";
import { addComment, listComments } from "@/lib/server/workspace/comments";

type Params = { team: string; scenario: string; number: string };

/** team:read → CommentListResponse (threads, oldest first). */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  listComments(db, actor, params.team, params.scenario, params.number),
);

/** comment:write; body CommentInput { body, parentId?, increment? } → 201 threads + new id. */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.small);
  return new Created(
    await addComment(db, actor, params.team, params.scenario, params.number, body),
  );
});

import { apiRoute } from "@/lib/server/http/route";
import { diffRevisions } from "@/lib/server/workspace/diff-revisions";

type Params = { team: string; scenario: string };

/** team:read; ?from=N&to=M → RevisionDiffResponse. */
export const GET = apiRoute<Params>(({ db, actor, params, query }) =>
  diffRevisions(db, actor, params.team, params.scenario, query.from, query.to),
);

import { apiRoute } from "@/lib/api/route";
import { getRevision } from "@/lib/workspace/revisions";

type Params = { team: string; scenario: string; number: string };

/** team:read → RevisionResponse (meta + the stored scenario file). */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  getRevision(db, actor, params.team, params.scenario, params.number),
);

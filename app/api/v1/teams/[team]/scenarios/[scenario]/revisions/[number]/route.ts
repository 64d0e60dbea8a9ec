import { tokenRoute } from "@/lib/server/http/route";
import { getRevision } from "@/lib/server/workspace/revisions";

type Params = { team: string; scenario: string; number: string };

/** team:read → RevisionResponse (meta + the stored scenario file). */
// Also open to personal API tokens of this team (lib/server/http/route.ts, tokenRoute).
export const GET = tokenRoute<Params>("team:read", ({ db, actor, params }) =>
  getRevision(db, actor, params.team, params.scenario, params.number),
);

import { apiRoute } from "@/lib/server/http/route";
import { listShareLinks } from "@/lib/server/workspace/share-links";

type Params = { team: string };

/** team:read; ?scenario=id narrows → ShareLinkListResponse (never tokens). */
export const GET = apiRoute<Params>(({ db, actor, params, query }) =>
  listShareLinks(db, actor, params.team, query.scenario),
);

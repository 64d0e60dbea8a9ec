import { apiRoute } from "@/lib/api/route";
import { listShareLinks } from "@/lib/workspace/share-links";

type Params = { team: string };

/** team:read; ?scenario=id narrows → ShareLinkListResponse (never tokens). */
export const GET = apiRoute<Params>(({ db, actor, params, query }) =>
  listShareLinks(db, actor, params.team, query.scenario),
);

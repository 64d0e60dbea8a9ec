import { apiRoute } from "@/lib/server/http/route";
import { revokeShareLink } from "@/lib/server/workspace/share-links";

type Params = { team: string; link: string };

/** share:create → { revoked: id }; revoking again is harmless. */
export const DELETE = apiRoute<Params>(({ db, actor, params }) =>
  revokeShareLink(db, actor, params.team, params.link),
);

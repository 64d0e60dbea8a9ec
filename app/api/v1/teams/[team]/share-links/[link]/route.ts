import { apiRoute } from "@/lib/api/route";
import { revokeShareLink } from "@/lib/workspace/share-links";

type Params = { team: string; link: string };

/** share:create → { revoked: id }; revoking again is harmless. */
export const DELETE = apiRoute<Params>(({ db, actor, params }) =>
  revokeShareLink(db, actor, params.team, params.link),
);

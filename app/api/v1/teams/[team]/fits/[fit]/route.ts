import { apiRoute } from "@/lib/server/http/route";
import { getFit } from "@/lib/server/records/fits";

type Params = { team: string; fit: string };

/** team:read → FitResponse (the fit and the computed curve over each test curve). */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  getFit(db, actor, params.team, params.fit),
);

import { apiRoute } from "@/lib/api/route";
import { exportTeam } from "@/lib/workspace/export";

type Params = { team: string };

/** export → TeamExportResponse (one JSON document: scenarios, revisions, sets, comments, reviews). */
export const GET = apiRoute<Params>(({ db, actor, params }) => exportTeam(db, actor, params.team));

import { apiRoute } from "@/lib/server/http/route";
import { getTestRecord } from "@/lib/server/records/records";

type Params = { team: string; record: string };

/** team:read → TestRecordResponse (summary and parsed points in mm/mm and MPa). */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  getTestRecord(db, actor, params.team, params.record),
);

import { apiRoute } from "@/lib/api/route";
import { getTestRecord } from "@/lib/records/records";

type Params = { team: string; record: string };

/** team:read → TestRecordResponse (summary and parsed points in mm/mm and MPa). */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  getTestRecord(db, actor, params.team, params.record),
);

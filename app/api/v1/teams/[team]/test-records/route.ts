import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { apiRoute, Created } from "@/lib/server/http/route";
import { listTestRecords } from "@/lib/server/records/records";
import { uploadTestRecord } from "@/lib/server/records/upload";

type Params = { team: string };

/** team:read → TestRecordListResponse (newest first, no points). */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  listTestRecords(db, actor, params.team),
);

/** test-record:edit; body UploadTestRecordInput → 201 { id, name, pointCount, warnings }. */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, BODY_LIMITS.upload);
  return new Created(await uploadTestRecord(db, actor, params.team, body));
});

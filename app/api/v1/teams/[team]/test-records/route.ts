import { readJsonBody } from "@/lib/server/http/body";
import { apiRoute, Created } from "@/lib/server/http/route";
import { MAX_FILE_BYTES } from "@/lib/csv/limits";
import { listTestRecords } from "@/lib/server/records/records";
import { uploadTestRecord } from "@/lib/server/records/upload";

type Params = { team: string };

// The file travels as JSON text: 10 MB of CSV plus escaping and the form stays below this.
const UPLOAD_BODY_LIMIT = 2 * MAX_FILE_BYTES;

/** team:read → TestRecordListResponse (newest first, no points). */
export const GET = apiRoute<Params>(({ db, actor, params }) =>
  listTestRecords(db, actor, params.team),
);

/** test-record:edit; body UploadTestRecordInput → 201 { id, name, pointCount, warnings }. */
export const POST = apiRoute<Params>(async ({ db, actor, params, request }) => {
  const body = await readJsonBody(request, UPLOAD_BODY_LIMIT);
  return new Created(await uploadTestRecord(db, actor, params.team, body));
});

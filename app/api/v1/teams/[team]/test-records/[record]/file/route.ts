import { apiRoute } from "@/lib/server/http/route";
import { getTestRecordFile } from "@/lib/server/records/records";

type Params = { team: string; record: string };

/** export → the original file exactly as uploaded, as an attachment. */
export const GET = apiRoute<Params>(async ({ db, actor, params }) => {
  const file = await getTestRecordFile(db, actor, params.team, params.record);
  const safe = file.fileName.replace(/[^\w.\- ]/g, "_");
  return new Response(file.fileText, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${safe}"`,
      "x-content-sha256": file.fileSha256,
      "cache-control": "no-store",
    },
  });
});

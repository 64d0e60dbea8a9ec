import { getDb } from "@/db/index";
import { actorFromRequest } from "@/lib/server/http/request-actor";
import { errorResponse } from "@/lib/server/http/respond";
import { getTestRecordFile } from "@/lib/server/records/records";

type Params = { team: string; record: string };

/** export → the original file exactly as uploaded, as an attachment. */
export async function GET(request: Request, context: { params: Promise<Params> }) {
  try {
    const { actor } = await actorFromRequest(request);
    const params = await context.params;
    const file = await getTestRecordFile(getDb(), actor, params.team, params.record);
    const safe = file.fileName.replace(/[^\w.\- ]/g, "_");
    return new Response(file.fileText, {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="${safe}"`,
        "x-content-sha256": file.fileSha256,
        "cache-control": "no-store",
      },
    });
  } catch (error) {
    return errorResponse(error);
  }
}

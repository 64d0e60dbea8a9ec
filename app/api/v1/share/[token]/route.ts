import { getDb } from "@/db/index";
import { clientAddressOf } from "@/lib/server/http/request-actor";
import { errorResponse, jsonResponse } from "@/lib/server/http/respond";
import { openSharedRevision } from "@/lib/server/workspace/share-view";

/**
 * Public: anyone holding the token reads that one revision (SharedRevisionResponse).
 * Expired, revoked and unknown tokens all answer 404 "no longer available".
 */
export async function GET(
  request: Request,
  context: { params: Promise<{ token: string }> },
): Promise<Response> {
  try {
    const { token } = await context.params;
    return jsonResponse(await openSharedRevision(getDb(), token, clientAddressOf(request)));
  } catch (error) {
    return errorResponse(error);
  }
}

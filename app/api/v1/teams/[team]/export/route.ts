import { jsonResponse } from "@/lib/server/http/respond";
import { apiRoute } from "@/lib/server/http/route";
import { exportTeam } from "@/lib/server/workspace/export";

type Params = { team: string };

/**
 * export → TeamExportResponse (one JSON document: scenarios, revisions, parameter sets,
 * comments, review history). `?download=1` asks the browser to save it as a file.
 */
export const GET = apiRoute<Params>(async ({ db, actor, params, query }) => {
  const doc = await exportTeam(db, actor, params.team);
  const response = jsonResponse(doc);
  if (query.download) {
    const day = doc.exportedAt.slice(0, 10);
    response.headers.set(
      "content-disposition",
      `attachment; filename="craquelure-${doc.team.slug}-${day}.json"`,
    );
  }
  return response;
});

import { tokenRoute } from "@/lib/server/http/route";
import { studyResultsZip } from "@/lib/server/handoff/studies/service";

type Params = { team: string; study: string };

/** export → application/zip: sets/*.csv (contract columns), summary.csv, README.txt. */
export const GET = tokenRoute<Params>("export", async ({ db, actor, params }) => {
  const { bytes, fileName } = await studyResultsZip(db, actor, params.team, params.study);
  return new Response(Buffer.from(bytes), {
    headers: {
      "content-type": "application/zip",
      "content-disposition": `attachment; filename="${fileName}"`,
      "cache-control": "no-store",
    },
  });
});

import { tokenRoute } from "@/lib/server/http/route";
import { referenceBundle } from "@/lib/server/handoff/bundle/service";

type Params = { team: string; scenario: string; number: string };

/** export → application/zip: scenario file, standard load cases and their curves, README.txt. */
export const GET = tokenRoute<Params>("export", async ({ db, actor, params }) => {
  const { bytes, fileName } = await referenceBundle(
    db,
    actor,
    params.team,
    params.scenario,
    params.number,
  );
  return new Response(Buffer.from(bytes), {
    headers: {
      "content-type": "application/zip",
      "content-disposition": `attachment; filename="${fileName}"`,
      "cache-control": "no-store",
    },
  });
});

import { tokenRoute } from "@/lib/server/http/route";
import { loadConformanceCheck } from "@/lib/server/handoff/conformance/service";

type Params = { team: string; scenario: string; number: string; check: string };

/** export → the check as CSV: verdict, tolerance, caution, then per increment both values and the difference. */
export const GET = tokenRoute<Params>("export", async ({ db, actor, params }) => {
  const ref = { teamSlug: params.team, scenarioId: params.scenario, number: params.number };
  const { differences, revision } = await loadConformanceCheck(db, actor, ref, params.check);
  return new Response(differences(), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="conformance-r${revision.number}-${params.check.slice(0, 8)}.csv"`,
      "cache-control": "no-store",
    },
  });
});

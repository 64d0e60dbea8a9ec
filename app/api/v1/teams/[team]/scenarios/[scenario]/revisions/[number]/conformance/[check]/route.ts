import { tokenRoute } from "@/lib/server/http/route";
import { findConformanceCheckOfRevision } from "@/lib/server/handoff/conformance/service";

type Params = { team: string; scenario: string; number: string; check: string };

/** team:read → one recorded check with its comparison per quantity. */
export const GET = tokenRoute<Params>("team:read", async ({ db, actor, params }) => {
  const ref = { teamSlug: params.team, scenarioId: params.scenario, number: params.number };
  const { row } = await findConformanceCheckOfRevision(db, actor, ref, params.check);
  return {
    id: row.id,
    fileName: row.fileName,
    passed: row.passed,
    firstFailIncrement: row.firstFailIncrement,
    createdAt: row.createdAt,
    result: row.result,
  };
});

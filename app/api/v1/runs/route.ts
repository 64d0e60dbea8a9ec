import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { tokenRoute } from "@/lib/server/http/route";
import { AppError } from "@/lib/shared/errors";
import { readRunRequest } from "@/lib/server/handoff/runs/run-request";
import { runInPool } from "@/lib/server/compute/run-stream";
import { checkApiCaps } from "@/lib/server/api-caps";

/**
 * Runs a scenario file with the same core and answers exactly what
 * `npm run --silent drive -- file.json [--set id] [--format csv|json]` prints. The run happens
 * in the compute pool (budget and caps there); its output streams as the worker produces it.
 * Bearer token (any role) or a signed-in session.
 */
export const POST = tokenRoute(
  "team:read",
  async ({ request, actor, query }) => {
    if (!actor) throw new AppError("unauthenticated", "Send a Bearer token or sign in first.");
    const body = await readJsonBody(request, BODY_LIMITS.scenario);
    const run = readRunRequest(body, query, request.headers.get("accept"));
    checkApiCaps(run.scenario);
    const output = await runInPool(run, actor.id);
    const headers: Record<string, string> = {
      "content-type": output.contentType,
      "cache-control": "no-store",
    };
    if (output.warnings.length > 0) headers["x-craquelure-warnings"] = output.warnings.join("; ");
    return new Response(output.body, { status: 200, headers });
  },
  { limitSessions: true },
);

import { BODY_LIMITS, readJsonBody } from "@/lib/server/http/body";
import { tokenRoute } from "@/lib/server/http/token-route";
import { AppError } from "@/lib/shared/errors";
import { budgetedRunner, runBudgetMs } from "@/lib/server/handoff/runs/budgeted-runner";
import { readRunRequest } from "@/lib/server/handoff/runs/run-request";
import { runScenario } from "@/lib/server/handoff/runs/run-scenario";
import { checkApiCaps } from "@/lib/server/api-caps";

/** Hands the pieces to the client one by one, releasing each once sent. */
function streamOf(chunks: string[]): ReadableStream<Uint8Array> {
  const encoder = new TextEncoder();
  let next = 0;
  return new ReadableStream({
    pull(controller) {
      if (next >= chunks.length) return controller.close();
      controller.enqueue(encoder.encode(chunks[next]));
      chunks[next++] = "";
    },
  });
}

/**
 * Runs a scenario file with the same core and answers exactly what
 * `npm run --silent drive -- file.json [--set id] [--format csv|json]` prints.
 * Bearer token (any role) or a signed-in session.
 */
export const POST = tokenRoute(
  "team:read",
  async ({ request, actor, query }) => {
    if (!actor) throw new AppError("unauthenticated", "Send a Bearer token or sign in first.");
    const body = await readJsonBody(request, BODY_LIMITS.scenario);
    const run = readRunRequest(body, query, request.headers.get("accept"));
    checkApiCaps(run.scenario);
    const output = runScenario(run, budgetedRunner(runBudgetMs()));
    const headers: Record<string, string> = {
      "content-type": output.contentType,
      "cache-control": "no-store",
    };
    if (output.warnings.length > 0) headers["x-craquelure-warnings"] = output.warnings.join("; ");
    return new Response(streamOf(output.chunks), { status: 200, headers });
  },
  { limitSessions: true },
);

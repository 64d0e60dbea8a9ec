/**
 * Where the bundled compute worker lives: one file per build folder (`.next`, `.next-test`, …),
 * so a test or bench build never swaps the worker under a running `scripts/start.sh`.
 * No `server-only`: next.config.ts and the integration setup read it too.
 */
import path from "node:path";

export function computeWorkerFile(env: Record<string, string | undefined> = process.env): string {
  if (env.COMPUTE_WORKER_FILE) return path.resolve(env.COMPUTE_WORKER_FILE);
  const dist = path.basename(env.CRAQUELURE_DIST_DIR || ".next");
  return path.join(process.cwd(), ".compute", dist, "worker.mjs");
}

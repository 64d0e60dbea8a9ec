/**
 * Bundles the compute worker into one plain JS file. piscina starts a worker thread from a file
 * on disk, and Next bundles server code into chunks no thread can load, so the worker is built
 * beside Next's build (next.config.ts) and by the integration tests' setup. Synchronous: the
 * config calls it before Next starts its own work. Runs in the project root.
 */
import path from "node:path";

import { buildSync } from "esbuild";

export function buildComputeWorker(outfile: string): void {
  const root = process.cwd();
  buildSync({
    entryPoints: [path.join(root, "lib/server/compute/worker/entry.ts")],
    outfile,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    tsconfig: path.join(root, "tsconfig.json"),
    alias: { "server-only": path.join(root, "lib/server/compute/worker/no-server-only.ts") },
    // Packages written as CommonJS call require(); an ES module has none of its own.
    banner: {
      js: 'import { createRequire as __craqRequire } from "node:module"; const require = __craqRequire(import.meta.url);',
    },
    logLevel: "warning",
  });
}

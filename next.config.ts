import { existsSync } from "node:fs";

import type { NextConfig } from "next";
import { PHASE_DEVELOPMENT_SERVER, PHASE_PRODUCTION_BUILD } from "next/constants";

import { PROXY_BODY_LIMIT } from "./lib/server/http/body-limits";
import { buildComputeWorker } from "./lib/server/compute/build-worker";
import { computeWorkerFile } from "./lib/server/compute/worker-file";

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Test and benchmark runs build into their own folder so they never replace the build that
  // scripts/start.sh is serving from .next (a swapped build 404s the running app's assets).
  distDir: process.env.CRAQUELURE_DIST_DIR || ".next",
  // postgres and nodemailer are Node-only: keep them out of the server bundle graph. piscina
  // starts worker threads from a file on disk, which bundling would break.
  serverExternalPackages: ["postgres", "nodemailer", "piscina"],
  // The proxy's copy of a body is cut at this size (10 MB by default), which made the 20 MB
  // upload and 64 MB import limits unreachable; the routes enforce their own limits (413).
  experimental: { proxyClientMaxBodySize: PROXY_BODY_LIMIT },
};

/**
 * The compute worker (lib/server/compute) is a separate bundle piscina loads from disk: built
 * with every `next build` and `next dev`, and by `next start` when it is missing.
 */
export default function config(phase: string): NextConfig {
  const workerFile = computeWorkerFile();
  if (phase === PHASE_PRODUCTION_BUILD || phase === PHASE_DEVELOPMENT_SERVER) {
    buildComputeWorker(workerFile);
  } else if (!existsSync(workerFile)) {
    buildComputeWorker(workerFile);
  }
  return nextConfig;
}

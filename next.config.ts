import { existsSync } from "node:fs";

import type { NextConfig } from "next";
import { PHASE_DEVELOPMENT_SERVER, PHASE_PRODUCTION_BUILD } from "next/constants";

import { ACTION_BODY_LIMIT, PROXY_BODY_LIMIT } from "./lib/server/http/body-limits";
import { API_SECURITY_HEADERS } from "./lib/server/http/security-headers";
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
  // The proxy (pages and server actions only) copies a body up to this size; the API routes,
  // which the proxy skips, enforce their own limits (413).
  experimental: {
    proxyClientMaxBodySize: PROXY_BODY_LIMIT,
    serverActions: { bodySizeLimit: ACTION_BODY_LIMIT },
  },
  // The proxy stamps pages with their per-request policy; JSON answers get a fixed one here.
  async headers() {
    return [
      {
        source: "/api/:path*",
        headers: Object.entries(API_SECURITY_HEADERS).map(([key, value]) => ({ key, value })),
      },
    ];
  },
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

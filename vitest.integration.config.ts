import path from "node:path";
import { defineConfig } from "vitest/config";

// Integration tests run against the real, already-migrated PostgreSQL that scripts/test.sh
// starts (DATABASE_URL). `server-only` throws outside a React server bundle, so it is
// replaced by an empty module here.
// The compute pool's worker file for these tests, apart from any build's (set here so the global
// setup that builds it and the test workers that load it agree).
process.env.COMPUTE_WORKER_FILE ??= ".compute/integration/worker.mjs";

export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(__dirname),
      "server-only": path.resolve(__dirname, "test/support/empty-module.ts"),
    },
  },
  test: {
    name: "integration",
    environment: "node",
    include: ["test/integration/**/*.test.ts"],
    fileParallelism: false,
    globalSetup: ["test/integration/support/compute-worker.ts"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});

import path from "node:path";
import { defineConfig } from "vitest/config";

// Browser tests drive Debian's Chromium through playwright-core against the production build
// that scripts/test.sh serves at E2E_BASE_URL. One file at a time: the machine has two cores.
export default defineConfig({
  resolve: { alias: { "@": path.resolve(__dirname) } },
  test: {
    name: "e2e",
    environment: "node",
    include: ["test/e2e/**/*.spec.ts"],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});

import path from "node:path";
import { defineConfig } from "vitest/config";

// Two projects: pure logic under node, components under happy-dom.
// Integration tests (real PostgreSQL) have their own config: vitest.integration.config.ts.
export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(__dirname),
      "server-only": path.resolve(__dirname, "test/support/empty-module.ts"),
    },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          environment: "node",
          include: ["test/unit/**/*.test.ts"],
        },
      },
      {
        extends: true,
        test: {
          name: "components",
          environment: "happy-dom",
          include: ["test/unit/**/*.test.tsx"],
        },
      },
    ],
  },
});

import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

// The walls between the bands of lib/ (DEVELOPERS.md, "Layout"). Cross-band imports use the "@/"
// alias, so the patterns name alias paths; a relative import that climbs out of its band is
// caught by the "../" patterns of the strict bands.
const restrict = (patterns, allowTypeImports = false) => [
  "error",
  {
    patterns: [
      {
        group: patterns,
        allowTypeImports,
        message: "This band may not import that (DEVELOPERS.md, Layout).",
      },
    ],
  },
];
const SERVER_TYPES_ONLY = {
  group: ["@/lib/server/*", "@/lib/server/**"],
  allowTypeImports: true,
  message: "Client code may import lib/server only as types (DEVELOPERS.md, Layout).",
};
const walls = [
  {
    files: ["lib/mechanics/**"],
    rules: {
      "@typescript-eslint/no-restricted-imports": restrict([
        "@/*",
        "!@/lib",
        "@/lib/*",
        "!@/lib/mechanics",
        "../*",
      ]),
    },
  },
  {
    files: ["lib/calibration/**", "lib/scenario/**", "lib/csv/**"],
    rules: {
      "@typescript-eslint/no-restricted-imports": restrict([
        "@/*",
        "!@/lib",
        "@/lib/*",
        "!@/lib/mechanics",
        "!@/lib/shared",
        "!@/lib/calibration",
        "!@/lib/scenario",
        "!@/lib/csv",
        "react",
        "react-dom",
        "next",
        "next/*",
      ]),
    },
  },
  {
    files: ["lib/shared/**"],
    // Known debt: the review-state enum is defined beside its table; moving it is a later step.
    ignores: ["lib/shared/validations/workspace.ts"],
    rules: {
      "@typescript-eslint/no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["@/db", "@/db/**"],
              allowTypeImports: true,
              message:
                "lib/shared may name database row types, never the database (DEVELOPERS.md, Layout).",
            },
            {
              group: [
                "react",
                "react-dom",
                "react/*",
                "next",
                "next/*",
                "@/lib/server/**",
                "@/lib/client/**",
                "@/components/**",
                "@/app/**",
                "server-only",
              ],
              message:
                "lib/shared is pure: no React, Next, server or client code (DEVELOPERS.md, Layout).",
            },
          ],
        },
      ],
    },
  },
  {
    files: ["lib/client/**", "components/**", "workers/**"],
    rules: {
      "@typescript-eslint/no-restricted-imports": [
        "error",
        {
          patterns: [
            SERVER_TYPES_ONLY,
            {
              group: ["@/db", "@/db/**"],
              allowTypeImports: true,
              message: "Client code may import the database only as types (DEVELOPERS.md, Layout).",
            },
          ],
        },
      ],
    },
  },
  {
    files: ["lib/server/**"],
    // Known debt: the demo seed reuses the loading desk presets (pure data) to write demo scenarios.
    ignores: ["lib/server/workspace/seed-demo-workspace.ts"],
    rules: {
      "@typescript-eslint/no-restricted-imports": restrict([
        "@/lib/client/**",
        "@/components/**",
        "@/app/**",
      ]),
    },
  },
  {
    files: ["db/**"],
    // db/seed.ts is a command-line script that calls the services to write demo data.
    ignores: ["db/seed.ts"],
    // Row types may name a service's result type (a JSON column); nothing else.
    rules: { "@typescript-eslint/no-restricted-imports": restrict(["@/lib/server/**"], true) },
  },
];

const config = [
  ...nextVitals,
  ...nextTs,
  {
    ignores: [
      ".next/**",
      ".next-test/**",
      ".next-bench/**",
      ".next-load/**",
      "node_modules/**",
      ".data/**",
      ".test-data/**",
      "migrations/**",
      "next-env.d.ts",
      "test-results/**",
      "artifacts/**",
      // The compute pool's built worker files (esbuild output, like the build folders).
      ".compute/**",
    ],
  },
  {
    rules: {
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_" },
      ],
    },
  },
  ...walls,
];

export default config;

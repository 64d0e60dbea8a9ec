import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

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
];

export default config;

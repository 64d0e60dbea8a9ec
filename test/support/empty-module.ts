// Stands in for `server-only` in node test runs (see vitest.integration.config.ts).
export {};

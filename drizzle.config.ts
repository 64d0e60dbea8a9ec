import { defineConfig } from "drizzle-kit";

// drizzle-kit does not read .env: the scripts export DATABASE_URL.
export default defineConfig({
  schema: "./db/schema/*.ts",
  out: "./migrations",
  dialect: "postgresql",
  dbCredentials: { url: process.env.DATABASE_URL ?? "postgres://app@127.0.0.1:5432/craquelure" },
  strict: true,
  verbose: true,
});

import path from "node:path";

import { migrate } from "drizzle-orm/postgres-js/migrator";

import { createDb, requireDatabaseUrl } from "./client";

// `npm run db:migrate`: applies the committed migrations/ in order; already-applied ones are skipped.
async function main() {
  const { db, close } = createDb(requireDatabaseUrl(), { max: 1 });
  try {
    await migrate(db, { migrationsFolder: path.join(process.cwd(), "migrations") });
    console.log("migrations applied");
  } finally {
    await close();
  }
}

main().catch((error: unknown) => {
  console.error("migration failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});

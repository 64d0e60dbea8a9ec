import "server-only";

import { createDb, requireDatabaseUrl, type Db, type DbHandle } from "./client";

// One pool per server process. Created on first use so `next build` never needs a database;
// kept on globalThis so dev-mode module reloads do not open a new pool each time.
const holder = globalThis as unknown as { __craqDb?: DbHandle };

export function getDb(): Db {
  holder.__craqDb ??= createDb(requireDatabaseUrl());
  return holder.__craqDb.db;
}

import { sql, type SQL } from "drizzle-orm";
import type { PgColumn } from "drizzle-orm/pg-core";

/** A person as the API shows them: id and name, or null when the account is gone. */
export interface PersonRef {
  id: string;
  name: string;
}

/** Selects `{ id, name }` from a (possibly aliased, left-joined) users table, null when absent. */
export function personRef(id: PgColumn, name: PgColumn): SQL<PersonRef | null> {
  return sql<PersonRef | null>`case when ${id} is null then null else json_build_object('id', ${id}, 'name', ${name}) end`;
}

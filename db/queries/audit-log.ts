import { count, desc, eq } from "drizzle-orm";

import type { Executor } from "@/db/client";
import { auditEvents } from "@/db/schema/audit-events";
import { users } from "@/db/schema/users";

import { personRef } from "./users-view";

/** One page of a team's audit trail, newest first, with the total for the pager. */
export async function listAuditEventsForTeam(
  db: Executor,
  teamId: string,
  page: number,
  pageSize: number,
) {
  const [rows, [total]] = await Promise.all([
    db
      .select({
        id: auditEvents.id,
        action: auditEvents.action,
        target: auditEvents.target,
        detail: auditEvents.detail,
        actor: personRef(users.id, users.name),
        at: auditEvents.at,
      })
      .from(auditEvents)
      .leftJoin(users, eq(users.id, auditEvents.actorId))
      .where(eq(auditEvents.teamId, teamId))
      .orderBy(desc(auditEvents.at), desc(auditEvents.id))
      .limit(pageSize)
      .offset((page - 1) * pageSize),
    db.select({ n: count() }).from(auditEvents).where(eq(auditEvents.teamId, teamId)),
  ]);
  return {
    items: rows.map((r) => ({ ...r, at: r.at.toISOString() })),
    total: total.n,
    page,
    pageSize,
  };
}

export async function insertAuditEvent(
  db: Executor,
  values: typeof auditEvents.$inferInsert,
): Promise<void> {
  await db.insert(auditEvents).values(values);
}

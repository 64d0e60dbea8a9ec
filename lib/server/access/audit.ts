import type { Executor } from "@/db/client";
import { insertAuditEvent } from "@/db/queries/audit-log";

// Action names are stable strings ("team.create", "member.role-change", ...) so the trail can be
// queried later; detail holds what a reader needs once the row it points to is gone.
export interface AuditEntry {
  actorId: string | null;
  teamId?: string | null;
  action: string;
  target?: string | null;
  detail?: Record<string, unknown>;
}

export async function recordAudit(db: Executor, entry: AuditEntry): Promise<void> {
  await insertAuditEvent(db, {
    actorId: entry.actorId,
    teamId: entry.teamId ?? null,
    action: entry.action,
    target: entry.target ?? null,
    detail: entry.detail ?? {},
  });
}

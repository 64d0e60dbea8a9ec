import "server-only";

import { z } from "zod";

import type { Db } from "@/db/client";
import { listAuditEventsForTeam } from "@/db/queries/audit-log";
import type { Actor } from "@/lib/server/accounts/actor";
import { authorizeTeam } from "@/lib/server/access/team-access";

import { parseWithPath } from "./parse";

const pageSchema = z.object({
  page: z.coerce.number("Page must be a number.").int().min(1).max(1_000_000).default(1),
  pageSize: z.coerce.number("Page size must be a number.").int().min(1).max(200).default(50),
});

export type AuditLogResponse = Awaited<ReturnType<typeof listAuditEventsForTeam>>;

/** Every member may read the team's trail: it is how decisions stay traceable. */
export async function listAuditLog(
  db: Db,
  actor: Actor,
  teamSlug: string,
  query: unknown,
): Promise<AuditLogResponse> {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const { page, pageSize } = parseWithPath(pageSchema, query);
  return listAuditEventsForTeam(db, ctx.team.id, page, pageSize);
}

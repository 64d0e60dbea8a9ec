import { apiRoute } from "@/lib/server/http/route";
import { listAuditLog } from "@/lib/server/workspace/audit-log";

type Params = { team: string };

/** team:read; ?page&pageSize → AuditLogResponse (newest first). */
export const GET = apiRoute<Params>(({ db, actor, params, query }) =>
  listAuditLog(db, actor, params.team, query),
);

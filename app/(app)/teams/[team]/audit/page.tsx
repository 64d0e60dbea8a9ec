import type { Metadata } from "next";

import { QueryProvider } from "@/components/providers/query-provider";
import { getDb } from "@/db/index";
import { listAuditEventsForTeam } from "@/db/queries/audit-log";
import { requireTeamRole } from "@/lib/server/access/guard";

import { TeamNav } from "../team-nav";
import { AuditTable, AUDIT_PAGE_SIZE } from "./audit-table";

export const metadata: Metadata = { title: "Audit log" };

export default async function AuditPage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  // Every member reads the trail: it is how a decision stays traceable.
  const ctx = await requireTeamRole(slug, "team:read");
  const first = await listAuditEventsForTeam(getDb(), ctx.team.id, 1, AUDIT_PAGE_SIZE);
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <section aria-labelledby="audit-title" className="space-y-3">
        <h2 id="audit-title" className="font-display text-lg font-semibold">
          Audit log
        </h2>
        <p className="text-sm text-ink-soft">
          Who did what in this team, newest first. Entries are never edited or removed.
        </p>
        <QueryProvider>
          <AuditTable slug={ctx.team.slug} initial={first} />
        </QueryProvider>
      </section>
    </>
  );
}

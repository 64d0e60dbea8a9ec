import type { Metadata } from "next";
import Link from "next/link";

import { RecordsTable } from "@/components/records/records-table";
import { UploadPanel } from "@/components/records/upload-panel";
import { getDb } from "@/db/index";
import { listTestRecordsForTeam } from "@/db/queries/test-records";
import { requireTeamRole } from "@/lib/server/access/guard";
import { can } from "@/lib/shared/permissions";

import { TeamNav } from "../team-nav";

export const metadata: Metadata = { title: "Test records" };

export default async function TestRecordsPage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  const ctx = await requireTeamRole(slug, "team:read");
  const items = await listTestRecordsForTeam(getDb(), ctx.team.id);
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <div className="space-y-10">
        <section aria-labelledby="records-title" className="space-y-3">
          <div className="flex items-baseline justify-between">
            <h2 id="records-title" className="font-display text-lg font-semibold">
              Test records
            </h2>
            {can(ctx.role, "fit:run") ? (
              <Link
                href={`/teams/${ctx.team.slug}/fits/new`}
                className="text-sm text-verdigris-dark hover:underline"
              >
                Calibrate from these records
              </Link>
            ) : null}
          </div>
          <RecordsTable slug={ctx.team.slug} items={items} />
        </section>
        {can(ctx.role, "test-record:edit") ? <UploadPanel teamSlug={ctx.team.slug} /> : null}
      </div>
    </>
  );
}

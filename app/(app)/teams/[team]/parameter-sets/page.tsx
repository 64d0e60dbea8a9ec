import type { Metadata } from "next";

import { ParameterSetsTable } from "@/components/parameter-sets/parameter-sets-table";
import { QueryProvider } from "@/components/providers/query-provider";
import { getDb } from "@/db/index";
import { listParameterSetsForTeam } from "@/db/queries/parameter-sets";
import { requireTeamRole } from "@/lib/server/access/guard";
import { can } from "@/lib/shared/permissions";

import { TeamNav } from "../team-nav";

export const metadata: Metadata = { title: "Parameter sets" };

export default async function ParameterSetsPage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  const ctx = await requireTeamRole(slug, "team:read");
  const items = await listParameterSetsForTeam(getDb(), ctx.team.id);
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <section aria-labelledby="sets-title" className="space-y-3">
        <h2 id="sets-title" className="font-display text-lg font-semibold">
          Parameter sets
        </h2>
        <QueryProvider>
          <ParameterSetsTable
            slug={ctx.team.slug}
            canEdit={can(ctx.role, "parameter-set:edit")}
            initial={{ items }}
          />
        </QueryProvider>
      </section>
    </>
  );
}

import type { Metadata } from "next";
import Link from "next/link";

import { QueryProvider } from "@/components/providers/query-provider";
import { ScenariosTable } from "@/components/scenarios/scenarios-table";
import { Cautions } from "@/components/loading-desk/cautions";
import { getDb } from "@/db/index";
import { listScenariosForTeam } from "@/db/queries/scenarios";
import { requireTeamRole } from "@/lib/server/access/guard";
import { can } from "@/lib/shared/permissions";
import { listMembers } from "@/db/queries/teams";
import { scenarioListQuerySchema } from "@/lib/shared/validations/workspace";
import { teamPages } from "@/lib/client/data/api-urls";
import { listQueryString, PAGE_SIZE, parseListState } from "@/lib/client/data/list-query";

import { TeamNav } from "../team-nav";

export const metadata: Metadata = { title: "Scenarios" };

export default async function ScenariosPage({
  params,
  searchParams,
}: {
  params: Promise<{ team: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { team: slug } = await params;
  const ctx = await requireTeamRole(slug, "team:read");
  const state = parseListState(await searchParams);
  const query = listQueryString(state, PAGE_SIZE);
  const db = getDb();
  // First page read on the server; the table refetches through the list route from then on.
  const [data, members] = await Promise.all([
    listScenariosForTeam(
      db,
      ctx.team.id,
      scenarioListQuerySchema.parse(Object.fromEntries(new URLSearchParams(query))),
    ),
    listMembers(db, ctx.team.id),
  ]);
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <section aria-labelledby="scenarios-title" className="space-y-4">
        <div className="flex items-baseline justify-between gap-3">
          <h2 id="scenarios-title" className="font-display text-lg font-semibold">
            Scenarios
          </h2>
          {can(ctx.role, "scenario:edit") ? (
            <Link
              href={teamPages(ctx.team.slug).newScenario}
              className="rounded-md bg-kiln px-3 py-1.5 text-sm text-white hover:bg-kiln-dark"
            >
              New scenario
            </Link>
          ) : null}
        </div>
        <QueryProvider>
          <ScenariosTable
            slug={ctx.team.slug}
            authors={members.map((m) => ({ id: m.userId, name: m.name }))}
            initial={{ query, data }}
          />
        </QueryProvider>
      </section>
      {can(ctx.role, "export") ? (
        <section
          aria-labelledby="export-title"
          className="mt-10 space-y-2 border-t border-glaze-line pt-4"
        >
          <h2 id="export-title" className="font-display text-base font-semibold">
            Export
          </h2>
          <p className="text-sm text-ink-soft">
            One JSON file with every scenario, revision, parameter set, comment and review of this
            team, for archiving or to load into a new team.{" "}
            <a
              href={`/api/v1/teams/${encodeURIComponent(ctx.team.slug)}/export?download=1`}
              className="text-verdigris-dark hover:underline"
              download
            >
              Download the team export
            </a>
            {can(ctx.role, "team:import") ? (
              <>
                {" "}
                · load one into an empty team under{" "}
                <Link
                  href={teamPages(ctx.team.slug).importSection}
                  className="text-verdigris-dark hover:underline"
                >
                  Import a team export
                </Link>
              </>
            ) : null}
          </p>
          <Cautions compact />
        </section>
      ) : null}
    </>
  );
}

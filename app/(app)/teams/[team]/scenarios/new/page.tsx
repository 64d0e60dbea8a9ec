import type { Metadata } from "next";
import Link from "next/link";

import { QueryProvider } from "@/components/providers/query-provider";
import { NewScenarioLoader } from "@/components/scenarios/new-scenario-loader";
import { requireTeamRole } from "@/lib/server/access/guard";
import { teamPages } from "@/lib/client/data/api-urls";

export const metadata: Metadata = { title: "New scenario" };

export default async function NewScenarioPage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  // Only those who may edit reach the form; the create route checks the same capability again.
  const ctx = await requireTeamRole(slug, "scenario:edit");
  return (
    <QueryProvider>
      <header className="mb-4">
        <p className="text-sm text-ink-faint">
          <Link href={`/teams/${ctx.team.slug}`} className="hover:underline">
            {ctx.team.name}
          </Link>{" "}
          /{" "}
          <Link href={teamPages(ctx.team.slug).scenarios} className="hover:underline">
            Scenarios
          </Link>{" "}
          /
        </p>
        <h1 className="font-display text-2xl font-semibold">New scenario</h1>
        <p className="text-sm text-ink-soft">
          Starts from the growing-cycles template with the demo set. Name it in the title field,
          shape the path and the sets, then save revision 1.
        </p>
      </header>
      <div className="relative left-1/2 -ml-[min(800px,calc(50vw-1rem))] w-[min(1600px,calc(100vw-2rem))]">
        <NewScenarioLoader slug={ctx.team.slug} />
      </div>
    </QueryProvider>
  );
}

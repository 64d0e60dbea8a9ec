import type { Metadata } from "next";
import Link from "next/link";

import { QueryProvider } from "@/components/providers/query-provider";
import { NewScenarioLoader } from "@/components/scenarios/new-scenario-loader";
import { getDb } from "@/db/index";
import { findParameterSetView } from "@/db/queries/parameter-sets";
import { requireTeamRole } from "@/lib/server/access/guard";
import { ROLE_LABELS, can } from "@/lib/shared/permissions";
import { teamPages } from "@/lib/client/data/api-urls";

export const metadata: Metadata = { title: "New scenario" };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function NewScenarioPage({
  params,
  searchParams,
}: {
  params: Promise<{ team: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { team: slug } = await params;
  // Any member reaches the page, so a viewer is told why they cannot create rather than
  // "team not found"; the create route checks scenario:edit again.
  const ctx = await requireTeamRole(slug, "team:read");
  const query = await searchParams;
  const setId = typeof query.set === "string" && UUID.test(query.set) ? query.set : null;
  const checkSet = setId ? await findParameterSetView(getDb(), ctx.team.id, setId) : null;
  const editable = can(ctx.role, "scenario:edit");
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
        {editable ? (
          <p className="text-sm text-ink-soft">
            {checkSet
              ? `Checks “${checkSet.name}” on tension → unload → compression and growing cycles, paths the coupon tests did not cover. Add sets to compare, then save revision 1.`
              : "Starts from the growing-cycles template with the demo set. Name it in the title field, shape the path and the sets, then save revision 1."}
          </p>
        ) : null}
      </header>
      {editable ? (
        <div className="relative left-1/2 -ml-[min(800px,calc(50vw-1rem))] w-[min(1600px,calc(100vw-2rem))]">
          <NewScenarioLoader
            slug={ctx.team.slug}
            checkSet={checkSet ? { name: checkSet.name, values: checkSet.values } : undefined}
          />
        </div>
      ) : (
        <p role="alert" className="rounded-md bg-amber-50 px-3 py-2 text-sm text-amber-900">
          You are a {ROLE_LABELS[ctx.role].toLowerCase()} of {ctx.team.name}: you may read and
          export its scenarios, but only editors and owners create them. Ask an owner for the editor
          role, or open the{" "}
          <Link href="/sandbox" className="underline">
            sandbox
          </Link>{" "}
          to try a path without saving.
        </p>
      )}
    </QueryProvider>
  );
}

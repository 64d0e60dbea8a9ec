import type { Metadata } from "next";
import { SiteHeader } from "@/app/_parts/site-header";
import { Cautions } from "@/components/loading-desk/cautions";
import { SandboxLoadingDesk } from "@/components/loading-desk/sandbox-loading-desk";
import { getDb } from "@/db/index";
import { listTeamsForUser } from "@/db/queries/teams";
import { getActor } from "@/lib/server/accounts/auth/session";
import { can } from "@/lib/shared/permissions";

export const metadata: Metadata = {
  title: "Sandbox",
  description:
    "Script a load path, edit parameter sets and watch the damage law answer, in your browser.",
};

/** Signed in: the teams whose store the sandbox may save into (the create route checks again). */
async function saveAccount() {
  const actor = await getActor();
  if (!actor) return null;
  const teams = await listTeamsForUser(getDb(), actor.id);
  return {
    teams: teams
      .filter((t) => can(t.role, "scenario:edit"))
      .map((t) => ({ slug: t.slug, name: t.name })),
  };
}

export default async function SandboxPage() {
  const account = await saveAccount();
  return (
    <>
      <SiteHeader />
      <main id="main">
        <div className="mx-auto max-w-[1600px] px-4 pt-4">
          <p className="text-sm text-ink-soft">
            {account
              ? "The sandbox runs entirely in your browser until you save: send the scenario as a link, or keep it in a team's store with “Save to team…”."
              : "The sandbox runs entirely in your browser; nothing is saved. Send the scenario as a link, or sign in to keep it in your team's store."}
          </p>
        </div>
        <SandboxLoadingDesk account={account} />
      </main>
      <footer className="mt-8 border-t border-glaze-line bg-glaze-deep/50">
        <div className="mx-auto max-w-[1600px] px-4 py-4">
          <Cautions />
        </div>
      </footer>
    </>
  );
}

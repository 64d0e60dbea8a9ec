import type { Metadata } from "next";
import Link from "next/link";

import { CreateTeamForm } from "@/components/teams/create-team-form";
import { Card } from "@/components/ui/card";
import { FormMessage } from "@/components/ui/form-message";
import { getDb } from "@/db/index";
import { ROLE_LABELS } from "@/lib/shared/permissions";
import { getActor } from "@/lib/server/accounts/auth/session";
import { listTeamsForUser } from "@/db/queries/teams";

export const metadata: Metadata = { title: "Teams" };

export default async function TeamsPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const actor = await getActor();
  if (!actor) return null; // the layout has redirected already
  const [myTeams, params] = await Promise.all([listTeamsForUser(getDb(), actor.id), searchParams]);
  return (
    <div className="space-y-8">
      <h1 className="font-display text-3xl font-semibold">Teams</h1>
      {params.notice === "deleted" ? (
        <FormMessage tone="success">The team was deleted.</FormMessage>
      ) : null}
      <Card title="Your teams" id="my-teams">
        {myTeams.length === 0 ? (
          <p className="text-sm text-ink-soft">
            You are not in a team yet. Create one, or accept an invitation.
          </p>
        ) : (
          <ul className="divide-y divide-glaze-line">
            {myTeams.map((team) => (
              <li key={team.slug} className="flex items-center justify-between py-2">
                <Link
                  href={`/teams/${team.slug}`}
                  className="font-medium text-verdigris-dark hover:underline"
                >
                  {team.name}
                </Link>
                <span className="text-sm text-ink-soft">{ROLE_LABELS[team.role]}</span>
              </li>
            ))}
          </ul>
        )}
      </Card>
      <Card title="Create a team" id="create-team">
        {actor.verified ? (
          <CreateTeamForm />
        ) : (
          <FormMessage tone="info">
            Confirm your e-mail address to create or join teams.{" "}
            <Link href="/account" className="underline">
              Account page
            </Link>
          </FormMessage>
        )}
      </Card>
    </div>
  );
}

import type { Metadata } from "next";

import { DeleteTeamForm } from "@/components/teams/delete-team-form";
import { RenameTeamForm } from "@/components/teams/rename-team-form";
import { Card } from "@/components/ui/card";
import { requireTeamRole } from "@/lib/server/access/guard";
import { can } from "@/lib/shared/permissions";

import { TeamNav } from "../team-nav";

export const metadata: Metadata = { title: "Team settings" };

export default async function TeamSettingsPage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  const ctx = await requireTeamRole(slug, "team:rename");
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <div className="space-y-6">
        <Card title="Name" id="rename">
          <RenameTeamForm teamSlug={ctx.team.slug} name={ctx.team.name} />
        </Card>
        {can(ctx.role, "team:delete") ? (
          <Card title="Delete the team" id="delete">
            <p className="mb-3 text-sm text-ink-soft">
              Removes the team, its memberships and open invitations. This cannot be undone.
            </p>
            <DeleteTeamForm teamSlug={ctx.team.slug} />
          </Card>
        ) : null}
      </div>
    </>
  );
}

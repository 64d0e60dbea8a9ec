import type { Metadata } from "next";

import { DeleteTeamForm } from "@/components/teams/delete-team-form";
import { RenameTeamForm } from "@/components/teams/rename-team-form";
import { TeamImportForm } from "@/components/teams/team-import-form";
import { Card } from "@/components/ui/card";
import { getDb } from "@/db/index";
import { countTeamContent } from "@/db/queries/workspace-import";
import { BODY_LIMITS } from "@/lib/server/http/body-limits";
import { requireTeamRole } from "@/lib/server/access/guard";
import { can } from "@/lib/shared/permissions";

import { TeamNav } from "../team-nav";

export const metadata: Metadata = { title: "Team settings" };

export default async function TeamSettingsPage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  const ctx = await requireTeamRole(slug, "team:rename");
  // Counted only for owners, who alone may import (the route checks again).
  const held = can(ctx.role, "team:import") ? await countTeamContent(getDb(), ctx.team.id) : null;
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <div className="space-y-6">
        <Card title="Name" id="rename">
          <RenameTeamForm teamSlug={ctx.team.slug} name={ctx.team.name} />
        </Card>
        {held ? (
          <Card title="Import a team export" id="import">
            <TeamImportForm
              teamSlug={ctx.team.slug}
              held={held}
              maxBytes={BODY_LIMITS.teamImport}
            />
          </Card>
        ) : null}
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

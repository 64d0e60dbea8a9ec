import type { Metadata } from "next";

import { InviteForm } from "@/components/teams/invite-form";
import { MemberRoleForm } from "@/components/teams/member-role-form";
import { ActionButton } from "@/components/ui/action-button";
import { Card } from "@/components/ui/card";
import { getDb } from "@/db/index";
import { requireTeamRole } from "@/lib/server/access/guard";
import { can, canGrant, grantableRoles, ROLE_LABELS } from "@/lib/shared/permissions";
import { listMembers, listOpenInvitations } from "@/db/queries/teams";

import { TeamNav } from "../team-nav";
import { leaveTeamAction, removeMemberAction, revokeInvitationAction } from "./actions";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  const ctx = await requireTeamRole(slug, "team:read");
  const teamSlug = ctx.team.slug;
  const mayInvite = can(ctx.role, "member:invite");
  const [members, invitations] = await Promise.all([
    listMembers(getDb(), ctx.team.id),
    mayInvite ? listOpenInvitations(getDb(), ctx.team.id) : Promise.resolve([]),
  ]);
  const roles = grantableRoles(ctx.role);
  return (
    <>
      <TeamNav slug={teamSlug} name={ctx.team.name} role={ctx.role} />
      <div className="space-y-6">
        <Card title="Members" id="member-list">
          <div className="relative overflow-x-auto">
            <table className="w-full text-left text-sm">
              <thead className="text-ink-faint">
                <tr>
                  <th scope="col" className="py-2 font-medium">
                    Name
                  </th>
                  <th scope="col" className="py-2 font-medium">
                    E-mail
                  </th>
                  <th scope="col" className="py-2 font-medium">
                    Role
                  </th>
                  <th scope="col" className="py-2 font-medium">
                    <span className="sr-only">Actions</span>
                  </th>
                </tr>
              </thead>
              <tbody className="divide-y divide-glaze-line">
                {members.map((m) => {
                  const isMe = m.userId === ctx.actor.id;
                  const manage =
                    !isMe && can(ctx.role, "member:change-role") && canGrant(ctx.role, m.role);
                  return (
                    <tr key={m.userId} data-testid={`member-${m.email}`}>
                      <td className="py-2">
                        {m.name}
                        {isMe ? " (you)" : ""}
                      </td>
                      <td className="py-2 text-ink-soft">{m.email}</td>
                      <td className="py-2">
                        {manage ? (
                          <MemberRoleForm
                            teamSlug={teamSlug}
                            userId={m.userId}
                            memberName={m.name}
                            role={m.role}
                            roles={roles}
                          />
                        ) : (
                          <span data-testid="member-role">{ROLE_LABELS[m.role]}</span>
                        )}
                      </td>
                      <td className="py-2 text-right">
                        {isMe ? (
                          <ActionButton
                            label="Leave team"
                            confirmText="Leave this team?"
                            action={leaveTeamAction.bind(null, { teamSlug })}
                          />
                        ) : manage && can(ctx.role, "member:remove") ? (
                          <ActionButton
                            label="Remove"
                            variant="danger"
                            confirmText={`Remove ${m.name} from the team?`}
                            action={removeMemberAction.bind(null, { teamSlug, userId: m.userId })}
                          />
                        ) : null}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        </Card>
        {mayInvite ? (
          <Card title="Invite someone" id="invite">
            <InviteForm teamSlug={teamSlug} roles={roles} />
            {invitations.length > 0 ? (
              <>
                <h3 className="mt-6 text-sm font-medium">Open invitations</h3>
                <ul className="mt-2 divide-y divide-glaze-line text-sm">
                  {invitations.map((inv) => (
                    <li key={inv.id} className="flex items-center justify-between gap-3 py-2">
                      <span>
                        {inv.email} · {ROLE_LABELS[inv.role]} · until{" "}
                        {inv.expiresAt.toISOString().slice(0, 10)}
                      </span>
                      <ActionButton
                        label="Withdraw"
                        action={revokeInvitationAction.bind(null, {
                          teamSlug,
                          invitationId: inv.id,
                        })}
                      />
                    </li>
                  ))}
                </ul>
              </>
            ) : null}
          </Card>
        ) : null}
      </div>
    </>
  );
}

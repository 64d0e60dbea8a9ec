"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";

import { getDb } from "@/db/index";
import { getActor } from "@/lib/server/accounts/auth/session";
import { mailDeps } from "@/lib/server/email/deps";
import { runAction, type ActionResult } from "@/lib/shared/errors";
import { inviteMember } from "@/lib/server/teams/invitations";
import { changeMemberRole, leaveTeam, removeMember } from "@/lib/server/teams/members";
import { revokeInvitation } from "@/lib/server/teams/revoke-invitation";

// Each service authorizes the actor for its own capability (lib/server/access/team-access.ts), so a forged
// team slug, user id or role in the payload is refused there, not trusted here.

function slugOf(input: unknown): string {
  const slug = (input as { teamSlug?: unknown } | null)?.teamSlug;
  return typeof slug === "string" ? slug : "";
}

function refresh(input: unknown) {
  revalidatePath(`/teams/${slugOf(input)}/members`);
}

export async function inviteAction(input: unknown): Promise<ActionResult<{ mailQueued: boolean }>> {
  const result = await runAction(async () => {
    const invitation = await inviteMember(getDb(), await getActor(), input, mailDeps());
    return { mailQueued: invitation.mailQueued };
  });
  if (result.ok) refresh(input);
  return result;
}

export async function revokeInvitationAction(input: unknown): Promise<ActionResult> {
  const result = await runAction(async () => revokeInvitation(getDb(), await getActor(), input));
  if (result.ok) refresh(input);
  return result;
}

export async function changeRoleAction(input: unknown): Promise<ActionResult> {
  const result = await runAction(async () => changeMemberRole(getDb(), await getActor(), input));
  if (result.ok) refresh(input);
  return result;
}

export async function removeMemberAction(input: unknown): Promise<ActionResult> {
  const result = await runAction(async () => removeMember(getDb(), await getActor(), input));
  if (result.ok) refresh(input);
  return result;
}

export async function leaveTeamAction(input: unknown): Promise<ActionResult> {
  const result = await runAction(async () => leaveTeam(getDb(), await getActor(), input));
  if (result.ok) redirect("/teams");
  return result;
}

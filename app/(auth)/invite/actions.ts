"use server";

import { redirect } from "next/navigation";

import { getDb } from "@/db/index";
import { getActor } from "@/lib/server/accounts/auth/session";
import { runAction, type ActionResult } from "@/lib/shared/errors";
import { acceptInvitation } from "@/lib/server/teams/accept-invitation";

export async function acceptInvitationAction(token: unknown): Promise<ActionResult<string>> {
  const result = await runAction(
    async () => (await acceptInvitation(getDb(), await getActor(), token)).slug,
  );
  if (result.ok) redirect(`/teams/${result.data}`);
  return result;
}

"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";

import { getDb } from "@/db/index";
import { getActor } from "@/lib/server/accounts/auth/session";
import { runAction, type ActionResult } from "@/lib/shared/errors";
import { deleteTeam, renameTeam } from "@/lib/server/teams/settings";

export async function renameTeamAction(input: unknown): Promise<ActionResult> {
  const result = await runAction(async () => {
    const team = await renameTeam(getDb(), await getActor(), input);
    revalidatePath(`/teams/${team.slug}`, "layout");
  });
  return result;
}

export async function deleteTeamAction(input: unknown): Promise<ActionResult> {
  const result = await runAction(async () => deleteTeam(getDb(), await getActor(), input));
  if (result.ok) redirect("/teams?notice=deleted");
  return result;
}

"use server";

import { redirect } from "next/navigation";

import { getDb } from "@/db/index";
import { getActor } from "@/lib/server/accounts/auth/session";
import { runAction, type ActionResult } from "@/lib/shared/errors";
import { createTeam } from "@/lib/server/teams/create";

export async function createTeamAction(input: unknown): Promise<ActionResult<string>> {
  const result = await runAction(
    async () => (await createTeam(getDb(), await getActor(), input)).slug,
  );
  if (result.ok) redirect(`/teams/${result.data}`);
  return result;
}

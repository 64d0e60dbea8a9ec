"use server";

import { revalidatePath } from "next/cache";

import { getDb } from "@/db/index";
import { createApiToken, revokeApiToken } from "@/lib/server/accounts/api-tokens/manage";
import { getActor } from "@/lib/server/accounts/auth/session";
import { runAction } from "@/lib/shared/errors";

/** The secret comes back once, here; the page never shows it again. */
export async function createApiTokenAction(input: unknown) {
  return runAction(async () => {
    const created = await createApiToken(getDb(), await getActor(), input);
    revalidatePath("/account");
    return created;
  });
}

export async function revokeApiTokenAction(tokenId: string) {
  return runAction(async () => {
    const result = await revokeApiToken(getDb(), await getActor(), tokenId);
    revalidatePath("/account");
    return result;
  });
}

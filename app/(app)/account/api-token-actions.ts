"use server";

import { revalidatePath } from "next/cache";

import { getDb } from "@/db/index";
import { createApiToken, revokeApiToken } from "@/lib/api-tokens/manage";
import { getActor } from "@/lib/auth/session";
import { runAction } from "@/lib/errors";

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

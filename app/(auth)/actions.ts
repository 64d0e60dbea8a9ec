"use server";

import { redirect } from "next/navigation";

import { getDb } from "@/db/index";
import { requestPasswordReset, resetPassword } from "@/lib/server/accounts/password-reset";
import { authenticate } from "@/lib/server/accounts/sign-in";
import { signUp } from "@/lib/server/accounts/sign-up";
import { resendVerification, verifyEmail } from "@/lib/server/accounts/verify-email";
import { getClientAddress } from "@/lib/server/accounts/auth/client-address";
import { endSession, getActor, startSession } from "@/lib/server/accounts/auth/session";
import { mailDeps } from "@/lib/server/email/deps";
import { AppError, runAction, type ActionResult } from "@/lib/shared/errors";
import { safeNextPath } from "@/lib/shared/safe-next";

// Thin wrappers: session, request address and mailer come from the request; the rules live in
// lib/server/accounts and are tested there. Every input is re-validated by the service's zod schema.

export async function signUpAction(input: unknown): Promise<ActionResult> {
  const result = await runAction(async () => {
    await signUp(getDb(), input, await getClientAddress(), mailDeps());
  });
  if (result.ok) redirect("/sign-in?notice=check-mail");
  return result;
}

export async function signInAction(input: unknown, next?: unknown): Promise<ActionResult> {
  const result = await runAction(async () => {
    const user = await authenticate(getDb(), input, await getClientAddress());
    await startSession(user.id);
  });
  if (result.ok) redirect(safeNextPath(next));
  return result;
}

export async function signOutAction(): Promise<void> {
  await endSession();
  redirect("/sign-in?notice=signed-out");
}

export async function verifyEmailAction(token: unknown): Promise<ActionResult> {
  const result = await runAction(async () => {
    await verifyEmail(getDb(), token);
  });
  if (result.ok) redirect((await getActor()) ? "/teams" : "/sign-in?notice=verified");
  return result;
}

export async function resendVerificationAction(): Promise<ActionResult> {
  return runAction(async () => {
    const actor = await getActor();
    if (!actor) throw new AppError("unauthenticated", "Please sign in first.");
    await resendVerification(getDb(), actor, mailDeps());
  });
}

export async function requestResetAction(input: unknown): Promise<ActionResult> {
  return runAction(async () => {
    await requestPasswordReset(getDb(), input, await getClientAddress(), mailDeps());
  });
}

export async function resetPasswordAction(input: unknown): Promise<ActionResult> {
  const result = await runAction(async () => {
    await resetPassword(getDb(), input);
  });
  if (result.ok) {
    // Every session of the user was ended, including this browser's.
    await endSession();
    redirect("/sign-in?notice=password-changed");
  }
  return result;
}

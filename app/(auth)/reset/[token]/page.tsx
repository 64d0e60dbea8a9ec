import type { Metadata } from "next";
import Link from "next/link";

import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { FormMessage } from "@/components/ui/form-message";
import { getDb } from "@/db/index";
import { checkResetToken } from "@/lib/server/accounts/password-reset";
import { isAppError } from "@/lib/shared/errors";

export const metadata: Metadata = { title: "Choose a new password", referrer: "no-referrer" };

export default async function ResetPasswordPage({
  params,
}: {
  params: Promise<{ token: string }>;
}) {
  const { token } = await params;
  // Say at once when the link is dead instead of after the user typed two passwords.
  const problem = await checkResetToken(getDb(), token).then(
    () => null,
    (error: unknown) => {
      if (isAppError(error)) return error.message;
      throw error;
    },
  );
  return (
    <>
      <h1 className="mb-6 font-display text-2xl font-semibold">Choose a new password</h1>
      {problem ? (
        <div className="space-y-4">
          <FormMessage tone="error">{problem}</FormMessage>
          <Link href="/reset" className="text-sm text-verdigris-dark hover:underline">
            Ask for a new link
          </Link>
        </div>
      ) : (
        <ResetPasswordForm token={token} />
      )}
    </>
  );
}

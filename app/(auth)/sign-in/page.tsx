import type { Metadata } from "next";
import Link from "next/link";

import { SignInForm } from "@/components/auth/sign-in-form";
import { FormMessage } from "@/components/ui/form-message";
import { safeNextPath } from "@/lib/shared/safe-next";

export const metadata: Metadata = { title: "Sign in" };

// Notices come from redirects of our own actions; unknown values show nothing.
const NOTICES: Record<string, string> = {
  // The same words whether or not the address had an account: sign-up must not tell.
  "check-mail":
    "Thank you. We sent a mail to that address: follow its link to confirm the address, then sign in.",
  verified: "Your e-mail address is confirmed. You can sign in now.",
  "password-changed": "Password changed, and every session signed out. Sign in with the new one.",
  "signed-out": "You are signed out.",
};

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const params = await searchParams;
  const notice = typeof params.notice === "string" ? NOTICES[params.notice] : undefined;
  const next = safeNextPath(params.next);
  return (
    <>
      <h1 className="mb-6 font-display text-2xl font-semibold">Sign in</h1>
      {notice ? (
        <div className="mb-6">
          <FormMessage tone="success">{notice}</FormMessage>
        </div>
      ) : null}
      <SignInForm next={next} />
      <p className="mt-6 text-sm text-ink-soft">
        New here?{" "}
        <Link href="/sign-up" className="text-verdigris-dark hover:underline">
          Create an account
        </Link>
      </p>
    </>
  );
}

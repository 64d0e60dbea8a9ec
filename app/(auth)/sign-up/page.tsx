import type { Metadata } from "next";
import Link from "next/link";

import { SignUpForm } from "@/components/auth/sign-up-form";

export const metadata: Metadata = { title: "Create account" };

export default function SignUpPage() {
  return (
    <>
      <h1 className="font-display text-2xl font-semibold">Create an account</h1>
      <p className="mb-6 mt-2 text-sm text-ink-soft">
        An account lets you save scenarios and work in a team. The sandbox works without one.
      </p>
      <SignUpForm />
      <p className="mt-6 text-sm text-ink-soft">
        Have an account already?{" "}
        <Link href="/sign-in" className="text-verdigris-dark hover:underline">
          Sign in
        </Link>
      </p>
    </>
  );
}

import type { Metadata } from "next";

import { ResetRequestForm } from "@/components/auth/reset-request-form";

export const metadata: Metadata = { title: "Reset password" };

export default function ResetRequestPage() {
  return (
    <>
      <h1 className="font-display text-2xl font-semibold">Reset your password</h1>
      <p className="mb-6 mt-2 text-sm text-ink-soft">
        Enter the address of your account and we will mail you a link to choose a new password.
      </p>
      <ResetRequestForm />
    </>
  );
}

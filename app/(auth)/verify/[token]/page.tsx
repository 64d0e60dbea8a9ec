import type { Metadata } from "next";

import { verifyEmailAction } from "@/app/(auth)/actions";
import { TokenActionButton } from "@/components/auth/token-action-button";

// The token is in the path: keep it out of Referer headers of anything this page loads.
export const metadata: Metadata = { title: "Confirm e-mail address", referrer: "no-referrer" };

export default async function VerifyPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <>
      <h1 className="font-display text-2xl font-semibold">Confirm your e-mail address</h1>
      <p className="mb-6 mt-2 text-sm text-ink-soft">
        One click and your address is confirmed; then you can found or join teams.
      </p>
      <TokenActionButton
        label="Confirm e-mail address"
        action={verifyEmailAction.bind(null, token)}
      />
    </>
  );
}

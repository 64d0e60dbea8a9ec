"use client";

import { useState } from "react";

import { revokeApiTokenAction } from "@/app/(app)/account/api-token-actions";

export function RevokeTokenButton({ tokenId, name }: { tokenId: string; name: string }) {
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function revoke() {
    if (!window.confirm(`Revoke the token "${name}"? Scripts using it stop working at once.`))
      return;
    setPending(true);
    const result = await revokeApiTokenAction(tokenId);
    setPending(false);
    if (!result.ok) setError(result.message);
  }
  return (
    <>
      <button
        type="button"
        onClick={revoke}
        disabled={pending}
        className="text-kiln-dark hover:underline"
      >
        Revoke
      </button>
      {error ? (
        <span role="alert" className="ml-2 text-kiln-dark">
          {error}
        </span>
      ) : null}
    </>
  );
}

"use client";

import { useEffect, useState } from "react";

import { Button } from "./button";

/**
 * Shown by error boundaries. Production builds pass only a digest, never the message or
 * stack; the digest lets an operator find the full error in the server log. Because the cause
 * is hidden, the notice asks /api/health whether the database is down, the one outage worth
 * naming: the person can do nothing about it but wait a moment.
 */
export function ErrorNotice({ digest, onRetry }: { digest?: string; onRetry: () => void }) {
  const [databaseDown, setDatabaseDown] = useState(false);
  useEffect(() => {
    fetch("/api/health", { cache: "no-store" })
      .then((r) => setDatabaseDown(r.status === 503))
      .catch(() => setDatabaseDown(false));
  }, []);
  return (
    <div role="alert" className="mx-auto max-w-md space-y-4 py-12 text-center">
      {databaseDown ? (
        <>
          <h1 className="font-display text-2xl font-semibold">The database is not reachable</h1>
          <p className="text-sm text-ink-soft">
            Nothing you saved is lost. Please try again shortly.
          </p>
        </>
      ) : (
        <>
          <h1 className="font-display text-2xl font-semibold">Something went wrong on our side</h1>
          <p className="text-sm text-ink-soft">
            Nothing you entered was lost on purpose; please try again.
          </p>
        </>
      )}
      {digest ? <p className="text-xs text-ink-faint">Reference: {digest}</p> : null}
      <Button type="button" onClick={onRetry}>
        Try again
      </Button>
    </div>
  );
}

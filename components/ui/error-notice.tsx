"use client";

import { Button } from "./button";

/**
 * Shown by error boundaries. Production builds pass only a digest, never the message or
 * stack; the digest lets an operator find the full error in the server log.
 */
export function ErrorNotice({ digest, onRetry }: { digest?: string; onRetry: () => void }) {
  return (
    <div role="alert" className="mx-auto max-w-md space-y-4 py-12 text-center">
      <h1 className="font-display text-2xl font-semibold">Something went wrong on our side</h1>
      <p className="text-sm text-ink-soft">
        Nothing you entered was lost on purpose; please try again.
      </p>
      {digest ? <p className="text-xs text-ink-faint">Reference: {digest}</p> : null}
      <Button type="button" onClick={onRetry}>
        Try again
      </Button>
    </div>
  );
}

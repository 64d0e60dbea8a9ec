"use client";

import { useState, useTransition } from "react";

import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { ActionResult } from "@/lib/shared/errors";

export interface TokenActionButtonProps {
  label: string;
  action: () => Promise<ActionResult<unknown> | undefined>;
  successMessage?: string;
}

/**
 * One button that runs a token-bound action (confirm e-mail, accept invitation). Links in
 * e-mails only show the page; the change happens on this deliberate POST, so mail scanners
 * that prefetch links cannot use a single-use token up.
 */
export function TokenActionButton({ label, action, successMessage }: TokenActionButtonProps) {
  const [pending, start] = useTransition();
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  return (
    <div className="space-y-3">
      {message ? <FormMessage tone={message.tone}>{message.text}</FormMessage> : null}
      <Button
        type="button"
        pending={pending}
        onClick={() =>
          start(async () => {
            const result = await action().catch(() => undefined);
            if (result && !result.ok) setMessage({ tone: "error", text: result.message });
            else if (result?.ok && successMessage)
              setMessage({ tone: "success", text: successMessage });
          })
        }
      >
        {label}
      </Button>
    </div>
  );
}

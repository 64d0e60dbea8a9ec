"use client";

import { useState, useTransition } from "react";

import type { ActionResult } from "@/lib/shared/errors";

import { Button, type ButtonProps } from "./button";
import { FieldError } from "./field";

export interface ActionButtonProps {
  label: string;
  action: () => Promise<ActionResult<unknown> | undefined>;
  /** Asked before running: for steps that cannot be undone. */
  confirmText?: string;
  variant?: ButtonProps["variant"];
  className?: string;
}

/** A button bound to one server action, with the action's refusal shown right below it. */
export function ActionButton({
  label,
  action,
  confirmText,
  variant = "secondary",
  className,
}: ActionButtonProps) {
  const [pending, start] = useTransition();
  const [error, setError] = useState<string>();
  return (
    <div className={className}>
      <Button
        type="button"
        variant={variant}
        pending={pending}
        onClick={() => {
          if (confirmText && !window.confirm(confirmText)) return;
          setError(undefined);
          start(async () => {
            const result = await action().catch(() => undefined);
            if (result && !result.ok) setError(result.message);
          });
        }}
      >
        {label}
      </Button>
      <FieldError message={error} />
    </div>
  );
}

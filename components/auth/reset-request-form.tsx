"use client";

import { useState } from "react";

import { requestResetAction } from "@/app/(auth)/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useActionForm } from "@/components/ui/use-action-form";
import { resetRequestSchema } from "@/lib/shared/validations/auth";

export function ResetRequestForm() {
  const [sent, setSent] = useState(false);
  const { form, onSubmit } = useActionForm(resetRequestSchema, requestResetAction, {
    onSuccess: () => setSent(true),
  });
  const { errors, isSubmitting } = form.formState;
  if (sent) {
    return (
      <FormMessage tone="success">
        If an account uses this address, a link to choose a new password is on its way. It works for
        one hour.
      </FormMessage>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {errors.root ? <FormMessage tone="error">{errors.root.message}</FormMessage> : null}
      <Field
        id="email"
        label="E-mail address"
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...form.register("email")}
      />
      <Button type="submit" pending={isSubmitting} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}

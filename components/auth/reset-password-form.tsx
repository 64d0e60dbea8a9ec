"use client";

import { resetPasswordAction } from "@/app/(auth)/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useActionForm } from "@/components/ui/use-action-form";
import { MIN_PASSWORD_LENGTH } from "@/lib/shared/password-rules";
import { resetPasswordSchema } from "@/lib/shared/validations/auth";

export function ResetPasswordForm({ token }: { token: string }) {
  const { form, onSubmit } = useActionForm(resetPasswordSchema, resetPasswordAction, {
    defaultValues: { token, password: "", confirm: "" },
  });
  const { errors, isSubmitting } = form.formState;
  const rootMessage = errors.root?.message ?? errors.token?.message;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {rootMessage ? <FormMessage tone="error">{rootMessage}</FormMessage> : null}
      <input type="hidden" {...form.register("token")} />
      <Field
        id="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Field
        id="confirm"
        label="New password, again"
        type="password"
        autoComplete="new-password"
        error={errors.confirm?.message}
        {...form.register("confirm")}
      />
      <Button type="submit" pending={isSubmitting} className="w-full">
        Set new password
      </Button>
    </form>
  );
}

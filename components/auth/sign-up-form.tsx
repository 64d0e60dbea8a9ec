"use client";

import { signUpAction } from "@/app/(auth)/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useActionForm } from "@/components/ui/use-action-form";
import { MIN_PASSWORD_LENGTH } from "@/lib/shared/password-rules";
import { signUpSchema } from "@/lib/shared/validations/auth";

export function SignUpForm() {
  const { form, onSubmit } = useActionForm(signUpSchema, signUpAction);
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {errors.root ? <FormMessage tone="error">{errors.root.message}</FormMessage> : null}
      <Field
        id="name"
        label="Name"
        autoComplete="name"
        error={errors.name?.message}
        {...form.register("name")}
      />
      <Field
        id="email"
        label="E-mail address"
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...form.register("email")}
      />
      <Field
        id="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters. A few unrelated words make a good one.`}
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" pending={isSubmitting} className="w-full">
        Create account
      </Button>
    </form>
  );
}

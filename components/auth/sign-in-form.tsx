"use client";

import Link from "next/link";

import { signInAction } from "@/app/(auth)/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useActionForm } from "@/components/ui/use-action-form";
import { signInSchema } from "@/lib/shared/validations/auth";

export function SignInForm({ next }: { next?: string }) {
  const { form, onSubmit } = useActionForm(signInSchema, (values) => signInAction(values, next));
  const { errors, isSubmitting } = form.formState;
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
      <Field
        id="password"
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" pending={isSubmitting} className="w-full">
        Sign in
      </Button>
      <p className="text-sm text-ink-soft">
        <Link href="/reset" className="text-verdigris-dark hover:underline">
          Forgot your password?
        </Link>
      </p>
    </form>
  );
}

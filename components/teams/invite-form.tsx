"use client";

import { useState } from "react";

import { inviteAction } from "@/app/(app)/teams/[team]/members/actions";
import { Button } from "@/components/ui/button";
import { Field, FieldError } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useActionForm } from "@/components/ui/use-action-form";
import type { Role } from "@/lib/shared/permissions";
import { MAIL_QUEUED_NOTICE } from "@/lib/shared/mail-types";
import { inviteSchema } from "@/lib/shared/validations/teams";

import { RoleSelect } from "./role-select";

export function InviteForm({ teamSlug, roles }: { teamSlug: string; roles: readonly Role[] }) {
  const [sentTo, setSentTo] = useState<string>();
  const [queued, setQueued] = useState(false);
  const { form, onSubmit } = useActionForm(inviteSchema, inviteAction, {
    defaultValues: { teamSlug, email: "", role: "viewer" },
    onSuccess: (data) => {
      setSentTo(form.getValues("email"));
      setQueued(data.mailQueued);
      form.reset({ teamSlug, email: "", role: form.getValues("role") });
    },
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3">
      {errors.root ? <FormMessage tone="error">{errors.root.message}</FormMessage> : null}
      {sentTo && !queued ? (
        <FormMessage tone="success">Invitation sent to {sentTo}.</FormMessage>
      ) : null}
      {sentTo && queued ? (
        <FormMessage tone="success">
          Invitation for {sentTo} created. {MAIL_QUEUED_NOTICE}
        </FormMessage>
      ) : null}
      <input type="hidden" {...form.register("teamSlug")} />
      <div className="flex flex-wrap items-start gap-3">
        <Field
          id="invite-email"
          label="E-mail address"
          type="email"
          className="min-w-64 flex-1"
          error={errors.email?.message}
          {...form.register("email")}
        />
        <div>
          <label htmlFor="invite-role" className="block text-sm font-medium">
            Role
          </label>
          <RoleSelect
            id="invite-role"
            roles={roles}
            className="mt-1"
            defaultValue="viewer"
            aria-invalid={errors.role ? true : undefined}
            aria-describedby={errors.role ? "invite-role-error" : undefined}
            {...form.register("role")}
          />
          <FieldError id="invite-role-error" message={errors.role?.message} />
        </div>
      </div>
      <Button type="submit" pending={isSubmitting}>
        Send invitation
      </Button>
    </form>
  );
}

"use client";

import { deleteTeamAction } from "@/app/(app)/teams/[team]/settings/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useActionForm } from "@/components/ui/use-action-form";
import { deleteTeamSchema } from "@/lib/shared/validations/teams";

export function DeleteTeamForm({ teamSlug }: { teamSlug: string }) {
  const { form, onSubmit } = useActionForm(deleteTeamSchema, deleteTeamAction, {
    defaultValues: { teamSlug, confirm: "" },
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3">
      {errors.root ? <FormMessage tone="error">{errors.root.message}</FormMessage> : null}
      <input type="hidden" {...form.register("teamSlug")} />
      <Field
        id="delete-confirm"
        label={`Type ${teamSlug} to confirm`}
        autoComplete="off"
        error={errors.confirm?.message}
        {...form.register("confirm")}
      />
      <Button type="submit" variant="danger" pending={isSubmitting}>
        Delete team for everyone
      </Button>
    </form>
  );
}

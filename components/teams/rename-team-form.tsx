"use client";

import { renameTeamAction } from "@/app/(app)/teams/[team]/settings/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useActionForm } from "@/components/ui/use-action-form";
import { renameTeamSchema } from "@/lib/shared/validations/teams";

export function RenameTeamForm({ teamSlug, name }: { teamSlug: string; name: string }) {
  const { form, onSubmit } = useActionForm(renameTeamSchema, renameTeamAction, {
    defaultValues: { teamSlug, name },
    onSuccess: () => form.reset(form.getValues()),
  });
  const { errors, isSubmitting, isSubmitSuccessful } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3">
      {errors.root ? <FormMessage tone="error">{errors.root.message}</FormMessage> : null}
      {isSubmitSuccessful && !errors.root ? <FormMessage tone="success">Saved.</FormMessage> : null}
      <input type="hidden" {...form.register("teamSlug")} />
      <Field
        id="rename"
        label="Team name"
        error={errors.name?.message}
        {...form.register("name")}
      />
      <Button type="submit" pending={isSubmitting}>
        Rename
      </Button>
    </form>
  );
}

"use client";

import { createTeamAction } from "@/app/(app)/teams/actions";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { useActionForm } from "@/components/ui/use-action-form";
import { createTeamSchema } from "@/lib/shared/validations/teams";

export function CreateTeamForm() {
  const { form, onSubmit } = useActionForm(createTeamSchema, createTeamAction);
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3">
      {errors.root ? <FormMessage tone="error">{errors.root.message}</FormMessage> : null}
      <Field
        id="team-name"
        label="Team name"
        placeholder="e.g. Bumper beam materials"
        error={errors.name?.message}
        {...form.register("name")}
      />
      <Button type="submit" pending={isSubmitting}>
        Create team
      </Button>
    </form>
  );
}

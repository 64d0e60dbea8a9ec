"use client";

import { changeRoleAction } from "@/app/(app)/teams/[team]/members/actions";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";
import { useActionForm } from "@/components/ui/use-action-form";
import type { Role } from "@/lib/shared/permissions";
import { changeRoleSchema } from "@/lib/shared/validations/teams";

import { RoleSelect } from "./role-select";

export interface MemberRoleFormProps {
  teamSlug: string;
  userId: string;
  memberName: string;
  role: Role;
  roles: readonly Role[];
}

export function MemberRoleForm({ teamSlug, userId, memberName, role, roles }: MemberRoleFormProps) {
  const { form, onSubmit } = useActionForm(changeRoleSchema, changeRoleAction, {
    defaultValues: { teamSlug, userId, role },
    // The saved role becomes the new baseline, so "Save role" greys out again.
    onSuccess: () => form.reset(form.getValues()),
  });
  const { errors, isSubmitting, isDirty } = form.formState;
  const id = `role-${userId}`;
  const message = errors.role?.message ?? errors.root?.message ?? errors.userId?.message;
  return (
    <form onSubmit={onSubmit} noValidate>
      <div className="flex items-center gap-2">
        <label htmlFor={id} className="sr-only">
          Role of {memberName}
        </label>
        {/* defaultValue renders the member's role on the server too: before hydration the
            select would otherwise show (and a quick click submit) the first role in the list. */}
        <RoleSelect
          id={id}
          roles={roles}
          defaultValue={role}
          {...form.register("role")}
          aria-describedby={`${id}-error`}
        />
        <Button type="submit" variant="secondary" pending={isSubmitting} disabled={!isDirty}>
          Save role
        </Button>
      </div>
      <FieldError id={`${id}-error`} message={message} />
    </form>
  );
}

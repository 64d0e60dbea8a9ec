import { z } from "zod";

import { ROLES } from "@/lib/shared/permissions";

import { emailSchema } from "./auth";

const teamNameSchema = z
  .string()
  .trim()
  .min(2, "Use at least 2 characters.")
  .max(80, "Keep the name under 80 characters.");

export const createTeamSchema = z.object({ name: teamNameSchema });
export type CreateTeamInput = z.input<typeof createTeamSchema>;

// Slugs come back from forms as hidden fields: validate their shape like any other input.
export const teamSlugSchema = z
  .string()
  .regex(/^[a-z0-9](?:[a-z0-9-]{0,62}[a-z0-9])?$/, "Unknown team.");

export const renameTeamSchema = z.object({ teamSlug: teamSlugSchema, name: teamNameSchema });
export type RenameTeamInput = z.input<typeof renameTeamSchema>;

const roleSchema = z.enum(ROLES, { error: "Choose one of the listed roles." });

export const inviteSchema = z.object({
  teamSlug: teamSlugSchema,
  email: emailSchema,
  role: roleSchema,
});
export type InviteInput = z.input<typeof inviteSchema>;

export const changeRoleSchema = z.object({
  teamSlug: teamSlugSchema,
  userId: z.uuid("Unknown member."),
  role: roleSchema,
});
export type ChangeRoleInput = z.input<typeof changeRoleSchema>;

export const memberSchema = z.object({
  teamSlug: teamSlugSchema,
  userId: z.uuid("Unknown member."),
});
export const teamRefSchema = z.object({ teamSlug: teamSlugSchema });

export const deleteTeamSchema = z.object({
  teamSlug: teamSlugSchema,
  // Typing the slug again guards against a slip of the mouse.
  confirm: z.string().trim(),
});

export const revokeInvitationSchema = z.object({
  teamSlug: teamSlugSchema,
  invitationId: z.uuid("Unknown invitation."),
});

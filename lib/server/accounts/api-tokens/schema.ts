import "server-only";

import { z } from "zod";

import { ROLES } from "@/lib/shared/permissions";

export const createApiTokenSchema = z.strictObject({
  name: z.string().trim().min(1, "Give the token a name.").max(100),
  team: z.string().min(1, "Choose a team.").max(100).describe("Team slug"),
  role: z.enum(ROLES),
});
export type CreateApiTokenInput = z.input<typeof createApiTokenSchema>;

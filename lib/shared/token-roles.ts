import { can, capabilitiesOf, type Capability, type Role } from "@/lib/shared/permissions";

// Roles are not a ladder: a reviewer may give verdicts, an editor may not, and the reverse
// for editing. So "no higher than yours" means: every capability of the token's role is one
// the owner holds. At use, a token may do only what both its role and the owner's current
// role allow.

export function roleWithin(role: Role, ceiling: Role): boolean {
  return capabilitiesOf(role).every((capability) => can(ceiling, capability));
}

export function tokenCan(tokenRole: Role, memberRole: Role, capability: Capability): boolean {
  return can(tokenRole, capability) && can(memberRole, capability);
}

import { ROLES, type Role } from "@/lib/auth/permissions";

// ROLES lists the roles from most to least powerful; a token acts with the lower of its own
// role and its owner's current role in the team.
const rank = (role: Role) => ROLES.length - ROLES.indexOf(role);

export function roleAtMost(role: Role, ceiling: Role): boolean {
  return rank(role) <= rank(ceiling);
}

export function lowerRole(a: Role, b: Role): Role {
  return rank(a) <= rank(b) ? a : b;
}

// THE role → capability table. Pure: used by the server guard, by tests, and by pages to decide
// which controls to show (showing is a courtesy; the server check is what counts).

export const ROLES = ["owner", "editor", "reviewer", "viewer"] as const;
export type Role = (typeof ROLES)[number];

export const CAPABILITIES = [
  "team:read",
  "team:rename",
  "team:delete",
  "member:invite",
  "member:change-role",
  "member:remove",
  // Loading a whole team export replaces nothing but writes everything: owners only.
  "team:import",
  "scenario:edit",
  "parameter-set:edit",
  "test-record:edit",
  "fit:run",
  "share:create",
  "review:verdict",
  "comment:write",
  "export",
] as const;
export type Capability = (typeof CAPABILITIES)[number];

const READ_AND_EXPORT: Capability[] = ["team:read", "export"];
const REVIEW: Capability[] = [...READ_AND_EXPORT, "comment:write", "review:verdict"];
// Editors do the engineering work; reviewers judge it. Editors may comment on their own work
// but a verdict stays with reviewers and owners so nobody approves alone by default.
const EDIT: Capability[] = [
  ...READ_AND_EXPORT,
  "comment:write",
  "scenario:edit",
  "parameter-set:edit",
  "test-record:edit",
  "fit:run",
  "share:create",
];

const TABLE: Record<Role, ReadonlySet<Capability>> = {
  // product.md: the owner may do everything, including members, roles and deleting the team.
  owner: new Set(CAPABILITIES),
  editor: new Set(EDIT),
  reviewer: new Set(REVIEW),
  viewer: new Set(READ_AND_EXPORT),
};

// Who may hand out which role (invite with it, or change someone to it). Only owners manage
// members, so only owners grant; they may grant every role, including owner.
const GRANTS: Record<Role, readonly Role[]> = {
  owner: ROLES,
  editor: [],
  reviewer: [],
  viewer: [],
};

export function can(role: Role | null | undefined, capability: Capability): boolean {
  return role ? TABLE[role].has(capability) : false;
}

export function capabilitiesOf(role: Role): Capability[] {
  return CAPABILITIES.filter((c) => TABLE[role].has(c));
}

export function canGrant(actorRole: Role | null | undefined, role: Role): boolean {
  return actorRole ? GRANTS[actorRole].includes(role) : false;
}

export function grantableRoles(actorRole: Role | null | undefined): readonly Role[] {
  return actorRole ? GRANTS[actorRole] : [];
}

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

export const ROLE_LABELS: Record<Role, string> = {
  owner: "Owner",
  editor: "Editor",
  reviewer: "Reviewer",
  viewer: "Viewer",
};

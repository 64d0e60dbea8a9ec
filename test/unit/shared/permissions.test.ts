import { describe, expect, it } from "vitest";

import {
  can,
  canGrant,
  CAPABILITIES,
  capabilitiesOf,
  grantableRoles,
  isRole,
  ROLES,
  type Capability,
  type Role,
} from "@/lib/shared/permissions";

// product.md's role table, written out here independently of the implementation.
const EXPECTED: Record<Role, Capability[]> = {
  owner: [...CAPABILITIES],
  editor: [
    "team:read",
    "export",
    "comment:write",
    "scenario:edit",
    "parameter-set:edit",
    "test-record:edit",
    "fit:run",
    "share:create",
  ],
  reviewer: ["team:read", "export", "comment:write", "review:verdict"],
  viewer: ["team:read", "export"],
};

describe("role → capability table", () => {
  for (const role of ROLES) {
    for (const capability of CAPABILITIES) {
      const allowed = EXPECTED[role].includes(capability);
      it(`${role} ${allowed ? "may" : "may not"} ${capability}`, () => {
        expect(can(role, capability)).toBe(allowed);
      });
    }
  }

  it("gives nobody outside the team anything", () => {
    for (const capability of CAPABILITIES) {
      expect(can(null, capability)).toBe(false);
      expect(can(undefined, capability)).toBe(false);
    }
  });

  it("lists capabilities in table order", () => {
    expect(capabilitiesOf("viewer")).toEqual(["team:read", "export"]);
    expect(capabilitiesOf("owner")).toEqual([...CAPABILITIES]);
  });

  it("only owners manage members, roles and the team itself", () => {
    const ownerOnly: Capability[] = [
      "team:rename",
      "team:delete",
      "member:invite",
      "member:change-role",
      "member:remove",
      "team:import",
    ];
    for (const capability of ownerOnly) {
      expect(ROLES.filter((r) => can(r, capability))).toEqual(["owner"]);
    }
  });
});

describe("who may grant which role", () => {
  it("lets owners grant every role, including owner", () => {
    expect(grantableRoles("owner")).toEqual(ROLES);
    for (const role of ROLES) expect(canGrant("owner", role)).toBe(true);
  });

  it("lets nobody else grant any role", () => {
    for (const actor of ["editor", "reviewer", "viewer", null] as const) {
      expect(grantableRoles(actor)).toEqual([]);
      for (const role of ROLES) expect(canGrant(actor, role)).toBe(false);
    }
  });

  it("recognises only the four roles", () => {
    expect(ROLES.every(isRole)).toBe(true);
    expect(isRole("admin")).toBe(false);
    expect(isRole("Owner")).toBe(false);
    expect(isRole(undefined)).toBe(false);
  });
});

import type { SelectHTMLAttributes } from "react";

import { ROLE_LABELS, type Role } from "@/lib/shared/permissions";

export interface RoleSelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  roles: readonly Role[];
}

export function RoleSelect({ roles, className = "", ...rest }: RoleSelectProps) {
  return (
    <select
      className={`rounded-md border border-glaze-line bg-white px-2 py-2 text-sm text-ink ${className}`}
      {...rest}
    >
      {roles.map((role) => (
        <option key={role} value={role}>
          {ROLE_LABELS[role]}
        </option>
      ))}
    </select>
  );
}

"use client";

import { useState } from "react";

import { createApiTokenAction } from "@/app/(app)/account/api-token-actions";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/shared/permissions";
import { roleWithin } from "@/lib/shared/token-roles";

import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export interface CreateTokenFormProps {
  teams: { slug: string; name: string; role: Role }[];
}

const INPUT = "mt-1 block w-full rounded-md border border-glaze-line bg-white px-3 py-2 text-sm";

export function CreateTokenForm({ teams }: CreateTokenFormProps) {
  const [team, setTeam] = useState(teams[0]?.slug ?? "");
  const [role, setRole] = useState<Role>("viewer");
  const [name, setName] = useState("");
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [secret, setSecret] = useState<string | null>(null);
  const ceiling = teams.find((t) => t.slug === team)?.role ?? "viewer";
  if (teams.length === 0) {
    return <p className="mt-4 text-sm text-ink-faint">Join or found a team to create a token.</p>;
  }
  async function submit(event: React.FormEvent) {
    event.preventDefault();
    setPending(true);
    setError(null);
    const result = await createApiTokenAction({ name, team, role });
    setPending(false);
    if (result.ok) {
      setSecret(result.data.token);
      setName("");
    } else setError(result.message);
  }
  return (
    <form onSubmit={submit} className="mt-4 grid gap-3 sm:grid-cols-4 sm:items-end">
      <label className="text-sm font-medium">
        Name
        <input
          className={INPUT}
          value={name}
          onChange={(e) => setName(e.target.value)}
          required
          maxLength={100}
        />
      </label>
      <label className="text-sm font-medium">
        Team
        <select className={INPUT} value={team} onChange={(e) => setTeam(e.target.value)}>
          {teams.map((t) => (
            <option key={t.slug} value={t.slug}>
              {t.name}
            </option>
          ))}
        </select>
      </label>
      <label className="text-sm font-medium">
        Role
        <select className={INPUT} value={role} onChange={(e) => setRole(e.target.value as Role)}>
          {ROLES.filter((r) => roleWithin(r, ceiling)).map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
      </label>
      <Button type="submit" pending={pending}>
        Create token
      </Button>
      {error ? (
        <div className="sm:col-span-4">
          <FormMessage tone="error">{error}</FormMessage>
        </div>
      ) : null}
      {secret ? (
        <div className="sm:col-span-4" data-testid="new-api-token">
          <FormMessage tone="success">
            Copy it now; it is shown only once:{" "}
            <code className="break-all font-mono">{secret}</code>
          </FormMessage>
        </div>
      ) : null}
    </form>
  );
}

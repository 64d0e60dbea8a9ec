import type { TeamListItem } from "@/db/queries/teams";
import type { listApiTokens } from "@/lib/server/accounts/api-tokens/manage";
import { ROLE_LABELS } from "@/lib/shared/permissions";

import { Card } from "@/components/ui/card";

import { CreateTokenForm } from "./create-token-form";
import { RevokeTokenButton } from "./revoke-token-button";

const when = (d: Date | null) => (d ? d.toISOString().slice(0, 16).replace("T", " ") : "never");

export type ApiTokenRow = Awaited<ReturnType<typeof listApiTokens>>[number];

/**
 * Account settings: personal API tokens for scripts and pipelines (see /docs/api). The account
 * page loads the tokens and teams; this card only shows them.
 */
export function ApiTokensCard({
  tokens,
  teams,
}: {
  tokens: readonly ApiTokenRow[];
  teams: readonly TeamListItem[];
}) {
  return (
    <Card title="API tokens" id="api-tokens">
      <p className="text-sm text-ink-soft">
        A token lets a script act as you in one team, with a role no higher than yours. Send it as{" "}
        <code>Authorization: Bearer …</code>; see the{" "}
        <a className="text-verdigris-dark hover:underline" href="/docs/api">
          API page
        </a>
        .
      </p>
      {tokens.length > 0 ? (
        <table className="mt-4 w-full text-sm" data-testid="api-token-table">
          <thead className="text-left text-ink-faint">
            <tr>
              <th className="py-1">Name</th>
              <th>Team</th>
              <th>Role</th>
              <th>Starts with</th>
              <th>Created</th>
              <th>Last used</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {tokens.map((t) => (
              <tr key={t.id} className="border-t border-glaze-line">
                <td className="py-1">{t.name}</td>
                <td>{t.teamName}</td>
                <td>{ROLE_LABELS[t.role]}</td>
                <td className="font-mono">{t.prefix}…</td>
                <td>{when(t.createdAt)}</td>
                <td>{when(t.lastUsedAt)}</td>
                <td className="text-right">
                  {t.revokedAt ? (
                    <span className="text-ink-faint">revoked</span>
                  ) : (
                    <RevokeTokenButton tokenId={t.id} name={t.name} />
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      <CreateTokenForm teams={teams.map((t) => ({ slug: t.slug, name: t.name, role: t.role }))} />
    </Card>
  );
}

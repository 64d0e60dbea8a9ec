import type { Metadata } from "next";
import Link from "next/link";

import { resendVerificationAction } from "@/app/(auth)/actions";
import { ApiTokensCard } from "@/components/api-tokens/api-tokens-card";
import { TokenActionButton } from "@/components/auth/token-action-button";
import { Card } from "@/components/ui/card";
import { FormMessage } from "@/components/ui/form-message";
import { getDb } from "@/db/index";
import { listTeamsForUser } from "@/db/queries/teams";
import { listApiTokens } from "@/lib/server/accounts/api-tokens/manage";
import { getActor } from "@/lib/server/accounts/auth/session";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const actor = await getActor();
  if (!actor) return null; // the layout has redirected already
  const db = getDb();
  const [tokens, teams] = await Promise.all([
    listApiTokens(db, actor),
    listTeamsForUser(db, actor.id),
  ]);
  return (
    <div className="space-y-6">
      <h1 className="font-display text-3xl font-semibold">Account</h1>
      <Card title="You" id="you">
        <dl className="grid grid-cols-[8rem_1fr] gap-y-2 text-sm">
          <dt className="text-ink-faint">Name</dt>
          <dd>{actor.name}</dd>
          <dt className="text-ink-faint">E-mail</dt>
          <dd>{actor.email}</dd>
          <dt className="text-ink-faint">Address</dt>
          <dd data-testid="verified-state">{actor.verified ? "Confirmed" : "Not confirmed yet"}</dd>
        </dl>
      </Card>
      {actor.verified ? null : (
        <Card title="Confirm your e-mail address" id="confirm">
          <FormMessage tone="info">
            Until your address is confirmed you can use the sandbox, but not create or join teams.
          </FormMessage>
          <div className="mt-4">
            <TokenActionButton
              label="Send a new confirmation link"
              action={resendVerificationAction}
              successMessage="Sent. The link works for 48 hours."
            />
          </div>
        </Card>
      )}
      <ApiTokensCard tokens={tokens} teams={teams} />
      <Card title="Password" id="password">
        <p className="text-sm text-ink-soft">
          To change it,{" "}
          <Link href="/reset" className="text-verdigris-dark hover:underline">
            ask for a reset link
          </Link>
          ; using it signs out all your sessions.
        </p>
      </Card>
    </div>
  );
}

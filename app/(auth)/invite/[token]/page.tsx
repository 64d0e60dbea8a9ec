import type { Metadata } from "next";
import Link from "next/link";

import { TokenActionButton } from "@/components/auth/token-action-button";
import { FormMessage } from "@/components/ui/form-message";
import { getDb } from "@/db/index";
import { ROLE_LABELS } from "@/lib/shared/permissions";
import { getActor } from "@/lib/server/accounts/auth/session";
import { isAppError } from "@/lib/shared/errors";
import { findInvitation, type InvitationView } from "@/lib/server/teams/accept-invitation";

import { acceptInvitationAction } from "../actions";

export const metadata: Metadata = { title: "Invitation", referrer: "no-referrer" };

const STATE_MESSAGES: Record<Exclude<InvitationView["state"], "valid">, string> = {
  used: "This invitation was accepted already.",
  revoked: "This invitation was withdrawn or replaced by a newer one. Ask the team's owner.",
  expired: "This invitation has expired. Ask the team's owner for a new one.",
};

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const view = await findInvitation(getDb(), token).catch((error: unknown) => {
    if (isAppError(error)) return error.message;
    throw error;
  });
  if (typeof view === "string")
    return (
      <Shell>
        <FormMessage tone="error">{view}</FormMessage>
      </Shell>
    );

  const actor = await getActor();
  const here = `/invite/${token}`;
  let body: React.ReactNode;
  if (view.state !== "valid")
    body = <FormMessage tone="error">{STATE_MESSAGES[view.state]}</FormMessage>;
  else if (!actor) {
    body = (
      <p className="text-sm text-ink-soft">
        <Link
          href={`/sign-in?next=${encodeURIComponent(here)}`}
          className="text-verdigris-dark hover:underline"
        >
          Sign in
        </Link>{" "}
        with {view.email}, or{" "}
        <Link href="/sign-up" className="text-verdigris-dark hover:underline">
          create an account
        </Link>{" "}
        for it and come back to this link.
      </p>
    );
  } else if (actor.email !== view.email) {
    body = (
      <FormMessage tone="error">
        This invitation is for {view.email}, but you are signed in as {actor.email}. Sign out and
        sign in with the invited address.
      </FormMessage>
    );
  } else if (!actor.verified) {
    body = (
      <FormMessage tone="info">
        Confirm your e-mail address first (see the link we mailed you, or your{" "}
        <Link href="/account" className="underline">
          account page
        </Link>
        ), then come back to this link.
      </FormMessage>
    );
  } else {
    body = (
      <TokenActionButton
        label="Accept and join"
        action={acceptInvitationAction.bind(null, token)}
      />
    );
  }
  return (
    <Shell>
      <p className="text-ink-soft">
        {view.inviterName ?? "A team owner"} invited {view.email} to join{" "}
        <strong className="text-ink">{view.team.name}</strong> as{" "}
        <strong className="text-ink">{ROLE_LABELS[view.role].toLowerCase()}</strong>.
      </p>
      <div className="mt-6">{body}</div>
    </Shell>
  );
}

function Shell({ children }: { children: React.ReactNode }) {
  return (
    <>
      <h1 className="mb-4 font-display text-2xl font-semibold">Team invitation</h1>
      {children}
    </>
  );
}

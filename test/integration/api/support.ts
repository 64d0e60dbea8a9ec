import type { Db } from "@/db/client";
import type { SignedInActor } from "@/lib/server/accounts/actor";
import { createApiToken } from "@/lib/server/accounts/api-tokens/manage";
import type { Role } from "@/lib/shared/permissions";

import { fromPeer } from "../support/peer";

/** A personal token of `actor` for `team` with `role`; returns the secret. */
export async function tokenFor(
  db: Db,
  actor: SignedInActor,
  team: string,
  role: Role,
): Promise<{ id: string; token: string }> {
  const created = await createApiToken(db, actor, { name: `token ${role}`, team, role });
  return { id: created.id, token: created.token };
}

export const bearer = (token: string) => ({ authorization: `Bearer ${token}` });

/** Calls a handler and keeps the body as text (CSV answers are not JSON). */
export async function callText(
  handler: unknown,
  opts: {
    params?: Record<string, string>;
    headers?: Record<string, string>;
    body?: unknown;
    url?: string;
    method?: string;
  },
) {
  const request = new Request(opts.url ?? "http://app.test/api/v1/runs", {
    method: opts.method ?? "POST",
    headers: { "content-type": "application/json", ...fromPeer(), ...opts.headers },
    body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
  });
  const response = await (
    handler as (r: Request, c: { params: Promise<unknown> }) => Promise<Response>
  )(request, { params: Promise.resolve(opts.params ?? {}) });
  return { status: response.status, text: await response.text(), headers: response.headers };
}

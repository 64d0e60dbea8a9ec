"use client";

import { useState } from "react";

import { Panel } from "@/components/ui/panel";
import { messageOf } from "@/lib/client/data/api-fetch";
import { formatWhen, personName } from "@/lib/client/data/format";
import {
  useCreateShareLink,
  useRevokeShareLink,
  useShareLinks,
} from "@/lib/client/data/use-share-links";

import { NewLinkNotice } from "./new-link-notice";

export interface ShareLinksPanelProps {
  slug: string;
  scenarioId: string;
  number: number;
}

const DAY_CHOICES = [1, 7, 14, 30, 90];

/** Links that show one revision read-only to people without an account; editors only. */
export function ShareLinksPanel({ slug, scenarioId, number }: ShareLinksPanelProps) {
  const links = useShareLinks(slug, scenarioId);
  const create = useCreateShareLink(slug, scenarioId, number);
  const revoke = useRevokeShareLink(slug, scenarioId);
  const [days, setDays] = useState(14);
  const [fresh, setFresh] = useState<string | null>(null);

  return (
    <Panel id="share" title="Share links" className="lg:col-span-2 xl:col-span-1">
      <div className="space-y-3 text-sm">
        <p className="text-ink-soft">
          A share link shows revision {number} read-only to anyone holding it, without an account,
          until it expires or you revoke it.
        </p>
        <form
          className="flex flex-wrap items-end gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            create.mutate(days, {
              onSuccess: (data) => setFresh(`${window.location.origin}${data.path}`),
            });
          }}
        >
          <label className="text-sm">
            Valid for
            <select
              value={days}
              onChange={(e) => setDays(Number(e.target.value))}
              className="ml-2 rounded-md border border-glaze-line bg-white px-2 py-1"
            >
              {DAY_CHOICES.map((d) => (
                <option key={d} value={d}>
                  {d} {d === 1 ? "day" : "days"}
                </option>
              ))}
            </select>
          </label>
          <button
            type="submit"
            disabled={create.isPending}
            className="rounded-md bg-verdigris px-3 py-1.5 text-white hover:bg-verdigris-dark disabled:opacity-60"
          >
            Create a share link to revision {number}
          </button>
        </form>
        {create.isError ? <p className="text-kiln-dark">{messageOf(create.error)}</p> : null}
        {fresh ? <NewLinkNotice url={fresh} onDone={() => setFresh(null)} /> : null}
        {links.isError ? <p className="text-kiln-dark">{messageOf(links.error)}</p> : null}
        {links.data?.items.length ? (
          <ul className="divide-y divide-glaze-line" data-testid="share-links">
            {links.data.items.map((l) => (
              <li key={l.id} className="flex items-start gap-3 py-2">
                <div className="min-w-0 flex-1">
                  <p>
                    <span className="font-medium">rev {l.revision}</span>{" "}
                    <span
                      className={l.state === "active" ? "text-verdigris-dark" : "text-ink-faint"}
                    >
                      {l.state}
                    </span>
                    <span className="text-ink-soft">
                      {" "}
                      · {l.viewCount} {l.viewCount === 1 ? "view" : "views"} ·{" "}
                      {l.state === "revoked"
                        ? `revoked ${formatWhen(l.revokedAt)}`
                        : `until ${formatWhen(l.expiresAt)}`}
                    </span>
                  </p>
                  <p className="text-xs text-ink-faint">
                    by {personName(l.createdBy)}, {formatWhen(l.createdAt)}
                  </p>
                </div>
                {l.state === "active" ? (
                  <button
                    type="button"
                    disabled={revoke.isPending}
                    onClick={() => revoke.mutate(l.id)}
                    className="rounded-md border border-kiln/40 px-2 py-0.5 text-kiln-dark hover:bg-kiln-light"
                  >
                    Revoke
                  </button>
                ) : null}
              </li>
            ))}
          </ul>
        ) : links.data ? (
          <p className="text-ink-soft">No share links for this scenario.</p>
        ) : null}
        {revoke.isError ? <p className="text-kiln-dark">{messageOf(revoke.error)}</p> : null}
      </div>
    </Panel>
  );
}

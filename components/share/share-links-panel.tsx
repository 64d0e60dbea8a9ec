"use client";

import { useState } from "react";

import { Panel } from "@/components/ui/panel";
import { messageOf } from "@/lib/workspace-client/api-fetch";
import { formatWhen, personName } from "@/lib/workspace-client/format";
import {
  useCreateShareLink,
  useRevokeShareLink,
  useShareLinks,
} from "@/lib/workspace-client/use-share-links";

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
          <table className="w-full text-left" data-testid="share-links">
            <thead className="text-xs text-ink-faint">
              <tr>
                <th className="py-1 font-medium">Revision</th>
                <th className="py-1 font-medium">Created</th>
                <th className="py-1 font-medium">Expires</th>
                <th className="py-1 font-medium">Views</th>
                <th className="py-1 font-medium">State</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {links.data.items.map((l) => (
                <tr key={l.id} className="border-t border-glaze-line/70">
                  <td className="py-1">rev {l.revision}</td>
                  <td className="py-1 text-ink-soft">
                    {personName(l.createdBy)}, {formatWhen(l.createdAt)}
                  </td>
                  <td className="py-1 text-ink-soft">{formatWhen(l.expiresAt)}</td>
                  <td className="py-1">{l.viewCount}</td>
                  <td className="py-1">{l.state}</td>
                  <td className="py-1 text-right">
                    {l.state === "active" ? (
                      <button
                        type="button"
                        disabled={revoke.isPending}
                        onClick={() => revoke.mutate(l.id)}
                        className="text-kiln-dark hover:underline"
                      >
                        Revoke
                      </button>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : links.data ? (
          <p className="text-ink-soft">No share links for this scenario.</p>
        ) : null}
        {revoke.isError ? <p className="text-kiln-dark">{messageOf(revoke.error)}</p> : null}
      </div>
    </Panel>
  );
}

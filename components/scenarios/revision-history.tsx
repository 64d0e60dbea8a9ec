"use client";

import Link from "next/link";
import { useState } from "react";

import { Panel } from "@/components/ui/panel";
import { messageOf } from "@/lib/client/data/api-fetch";
import { teamPages } from "@/lib/client/data/api-urls";
import { formatWhen, personName } from "@/lib/client/data/format";
import type { RevisionListResponse } from "@/lib/client/data/types";
import { useRevisions } from "@/lib/client/data/use-revisions";

import { ReviewBadge } from "./review-badge";
import { RevisionCompare } from "./revision-compare";

export interface RevisionHistoryProps {
  slug: string;
  scenarioId: string;
  current: number;
  initial: RevisionListResponse;
}

/** Every revision, newest first: open one read-only, overlay it, or compare two. */
export function RevisionHistory({ slug, scenarioId, current, initial }: RevisionHistoryProps) {
  const list = useRevisions(slug, scenarioId, initial);
  const items = list.data?.items ?? [];
  const latest = items[0]?.number ?? current;
  const [compare, setCompare] = useState<{ from: number; to: number } | null>(null);
  const pages = teamPages(slug);
  const open = (n: number, extra: Record<string, number | undefined> = {}) =>
    pages.scenario(scenarioId, { rev: n === latest ? undefined : n, ...extra });

  return (
    <Panel id="revisions" title="Revisions" aside={`${items.length} saved`}>
      {list.isError ? <p className="text-sm text-kiln-dark">{messageOf(list.error)}</p> : null}
      <ol className="divide-y divide-glaze-line text-sm" data-testid="revision-list">
        {items.map((r) => (
          <li key={r.id} className={`py-2 ${r.number === current ? "bg-glaze-deep/50" : ""}`}>
            <div className="flex flex-wrap items-center gap-2 px-1">
              <span className="font-medium">rev {r.number}</span>
              <ReviewBadge state={r.review.state} />
              <span className="text-ink-soft">
                {personName(r.author)}, {formatWhen(r.createdAt)}
              </span>
            </div>
            {r.message ? <p className="px-1 text-ink-soft">{r.message}</p> : null}
            <div className="mt-1 flex flex-wrap gap-3 px-1 text-xs">
              {r.number === current ? (
                <span className="text-ink-faint">on screen</span>
              ) : (
                <Link href={open(r.number)} className="text-verdigris-dark hover:underline">
                  Open{r.number === latest ? "" : " read-only"}
                </Link>
              )}
              {r.number !== current ? (
                <>
                  <Link
                    href={open(current, { overlay: r.number })}
                    className="text-verdigris-dark hover:underline"
                  >
                    Overlay curves on rev {current}
                  </Link>
                  <button
                    type="button"
                    onClick={() =>
                      setCompare({
                        from: Math.min(r.number, current),
                        to: Math.max(r.number, current),
                      })
                    }
                    className="text-verdigris-dark hover:underline"
                  >
                    Compare with rev {current}
                  </button>
                </>
              ) : null}
            </div>
          </li>
        ))}
      </ol>
      {items.length > 1 ? (
        <RevisionCompare
          slug={slug}
          scenarioId={scenarioId}
          numbers={items.map((r) => r.number)}
          value={compare ?? { from: items[1].number, to: items[0].number }}
          onChange={setCompare}
        />
      ) : null}
    </Panel>
  );
}

"use client";

import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useMemo } from "react";

import { messageOf } from "@/lib/client/data/api-fetch";
import { teamPages } from "@/lib/client/data/api-urls";
import { formatWhen, personName } from "@/lib/client/data/format";
import {
  listQueryString,
  parseListState,
  type ScenarioListState,
  toggleSort,
} from "@/lib/client/data/list-query";
import type { ScenarioListResponse } from "@/lib/client/data/types";
import { useScenarioList } from "@/lib/client/data/use-scenario-list";

import { ConformanceCell } from "./conformance-cell";
import { Pager } from "./pager";
import { ReviewBadge } from "./review-badge";
import { ScenarioFilters } from "./scenario-filters";
import { SortHeader } from "./sort-header";

export interface ScenariosTableProps {
  slug: string;
  authors: { id: string; name: string }[];
  initial: { query: string; data: ScenarioListResponse };
}

/** The team's scenarios: sorted, filtered and paged by the list route; the address keeps state. */
export function ScenariosTable({ slug, authors, initial }: ScenariosTableProps) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const state = useMemo(() => parseListState(params), [params]);
  const query = listQueryString(state);
  const list = useScenarioList(slug, query, initial);
  const pages = teamPages(slug);

  const go = (next: ScenarioListState) => {
    const address = listQueryString(next).replace(/&?pageSize=\d+/, "");
    router.replace(address ? `${pathname}?${address}` : pathname, { scroll: false });
  };
  const data = list.data;

  return (
    <div className="space-y-4">
      <ScenarioFilters key={state.tag} state={state} authors={authors} onChange={go} />
      {list.isError ? (
        <p role="alert" className="text-sm text-kiln-dark">
          {messageOf(list.error)}
        </p>
      ) : null}
      <div className="relative overflow-x-auto rounded-lg border border-glaze-line bg-white/70">
        <table className="w-full text-left text-sm" aria-busy={list.isFetching || undefined}>
          <thead className="border-b border-glaze-line bg-glaze-deep/60 text-xs text-ink-soft">
            <tr>
              <SortHeader
                label="Name"
                column="name"
                state={state}
                onSort={(c) => go(toggleSort(state, c))}
              />
              <th className="px-3 py-2 font-medium">Material</th>
              <th className="px-3 py-2 font-medium">Latest revision</th>
              <SortHeader
                label="Review"
                column="review"
                state={state}
                onSort={(c) => go(toggleSort(state, c))}
              />
              <th className="px-3 py-2 font-medium">Conformance</th>
              <SortHeader
                label="Updated"
                column="updated"
                state={state}
                onSort={(c) => go(toggleSort(state, c))}
              />
              <th className="px-3 py-2 font-medium">Author</th>
            </tr>
          </thead>
          <tbody>
            {data?.items.map((s) => (
              <tr key={s.id} className="border-b border-glaze-line/70 last:border-0">
                <td className="px-3 py-2">
                  <Link
                    href={pages.scenario(s.id)}
                    className="font-medium text-verdigris-dark hover:underline"
                  >
                    {s.name}
                  </Link>
                  {s.tags.length ? (
                    <div className="mt-0.5 flex flex-wrap gap-1">
                      {s.tags.map((t) => (
                        <button
                          key={t}
                          type="button"
                          onClick={() => go({ ...state, tag: t, page: 1 })}
                          className="rounded bg-glaze-deep px-1.5 text-xs text-ink-soft hover:bg-glaze-line"
                          title={`Only scenarios tagged ${t}`}
                        >
                          {t}
                        </button>
                      ))}
                    </div>
                  ) : null}
                </td>
                <td className="px-3 py-2 text-ink-soft">{s.materialLabel || "—"}</td>
                <td className="px-3 py-2">
                  rev {s.latestRevision.number}
                  <span className="text-ink-faint"> by {personName(s.latestRevision.author)}</span>
                </td>
                <td className="px-3 py-2">
                  <ReviewBadge state={s.latestRevision.reviewState} />
                </td>
                <td className="px-3 py-2">
                  <ConformanceCell verdict={s.conformance} />
                </td>
                <td className="whitespace-nowrap px-3 py-2 text-ink-soft">
                  {formatWhen(s.updatedAt)}
                </td>
                <td className="px-3 py-2 text-ink-soft">{personName(s.createdBy)}</td>
              </tr>
            ))}
            {data && data.items.length === 0 ? (
              <tr>
                <td colSpan={7} className="px-3 py-6 text-center text-ink-soft">
                  {state.tag || state.review || state.author
                    ? "No scenario matches these filters."
                    : "No scenarios yet."}
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      {data ? (
        <Pager
          page={data.page}
          pageSize={data.pageSize}
          total={data.total}
          what="scenarios"
          onPage={(page) => go({ ...state, page })}
        />
      ) : null}
    </div>
  );
}

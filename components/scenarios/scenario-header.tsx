import Link from "next/link";

import { teamPages } from "@/lib/client/data/api-urls";
import { formatWhen, personName } from "@/lib/client/data/format";
import type { RevisionMeta, ScenarioSummary } from "@/lib/client/data/types";

import { ReviewBadge } from "./review-badge";

export interface ScenarioHeaderProps {
  team: { slug: string; name: string };
  summary: ScenarioSummary;
  meta: RevisionMeta;
  latest: number;
}

/** Where we are (team / scenarios), the scenario's name and the revision on screen. */
export function ScenarioHeader({ team, summary, meta, latest }: ScenarioHeaderProps) {
  return (
    <header className="mb-4 space-y-1">
      <p className="text-sm text-ink-faint">
        <Link href={`/teams/${team.slug}`} className="hover:underline">
          {team.name}
        </Link>{" "}
        /{" "}
        <Link href={teamPages(team.slug).scenarios} className="hover:underline">
          Scenarios
        </Link>{" "}
        /
      </p>
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="font-display text-2xl font-semibold" data-testid="scenario-title">
          {summary.name}
        </h1>
        {summary.materialLabel ? (
          <span className="text-sm text-ink-soft">{summary.materialLabel}</span>
        ) : null}
        {summary.tags.map((t) => (
          <span key={t} className="rounded bg-glaze-deep px-1.5 text-xs text-ink-soft">
            {t}
          </span>
        ))}
      </div>
      <p
        className="flex flex-wrap items-center gap-2 text-sm text-ink-soft"
        data-testid="revision-line"
      >
        <span className="font-medium text-ink">
          Revision {meta.number} of {latest}
        </span>
        <ReviewBadge state={meta.review.state} />
        <span>
          saved by {personName(meta.author)} on {formatWhen(meta.createdAt)}
        </span>
        {meta.message ? <span className="italic">“{meta.message}”</span> : null}
        <a href="#review-title" className="text-verdigris-dark hover:underline">
          Review and comments
        </a>
        <a href="#revisions-title" className="text-verdigris-dark hover:underline">
          History
        </a>
        <Link
          href={`/teams/${team.slug}/scenarios/${summary.id}/revisions/${meta.number}/conformance`}
          className="text-verdigris-dark hover:underline"
        >
          Conformance checks
        </Link>
        <Link
          href={`/reports/${team.slug}/${summary.id}/${meta.number}`}
          className="text-verdigris-dark hover:underline"
        >
          Calibration report
        </Link>
      </p>
    </header>
  );
}

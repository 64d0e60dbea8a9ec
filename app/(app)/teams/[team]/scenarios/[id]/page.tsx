import type { Metadata } from "next";
import Link from "next/link";

import { HandoffPanel } from "@/components/handoff/handoff-panel";
import { QueryProvider } from "@/components/providers/query-provider";
import { ReviewPanel } from "@/components/reviews/review-panel";
import { RevisionHistory } from "@/components/scenarios/revision-history";
import { ScenarioDetailsEditor } from "@/components/scenarios/scenario-details-editor";
import { ScenarioEditorLoader } from "@/components/scenarios/scenario-editor-loader";
import { ScenarioHeader } from "@/components/scenarios/scenario-header";
import { ShareLinksPanel } from "@/components/share/share-links-panel";
import { getDb } from "@/db/index";
import { findLatestConformanceVerdict } from "@/db/queries/conformance-checks";
import { listReviewerChoices } from "@/db/queries/team-reviewers";
import { requireTeamRole } from "@/lib/server/access/guard";
import { can } from "@/lib/shared/permissions";
import { getActor } from "@/lib/server/accounts/auth/session";
import { teamPages } from "@/lib/client/data/api-urls";
import { overlayRevisions, samePath } from "@/lib/client/data/overlay";

import { loadScenarioPage, revisionParam } from "./load-scenario";

export const metadata: Metadata = { title: "Scenario" };

type SearchParams = Record<string, string | string[] | undefined>;

export default async function ScenarioPage({
  params,
  searchParams,
}: {
  params: Promise<{ team: string; id: string }>;
  searchParams: Promise<SearchParams>;
}) {
  const { team: slug, id } = await params;
  const ctx = await requireTeamRole(slug, "team:read");
  const query = await searchParams;
  const rev = revisionParam(query.rev);
  const overlay = revisionParam(query.overlay);
  const db = getDb();
  const data = await loadScenarioPage(db, ctx.team.id, id, rev, overlay);
  const { summary, number, meta, current, other } = data;
  const mayRequest = can(ctx.role, "scenario:edit");
  const [actor, latestCheck, reviewerChoices] = await Promise.all([
    getActor(),
    findLatestConformanceVerdict(db, ctx.team.id, summary.id, number),
    mayRequest ? listReviewerChoices(db, ctx.team.id, ctx.actor.id) : [],
  ]);
  const latest = summary.latestRevision.number;
  const editable = can(ctx.role, "scenario:edit") && number === latest && !other;
  const file = other
    ? overlayRevisions(
        { number, scenario: current.scenario, desk: current.opened.desk },
        { number: overlay!, scenario: other.scenario },
      )
    : current.opened;
  const pages = teamPages(ctx.team.slug);

  return (
    <QueryProvider>
      <ScenarioHeader
        team={{ slug: ctx.team.slug, name: ctx.team.name }}
        summary={summary}
        meta={meta}
        latest={latest}
      />
      {can(ctx.role, "scenario:edit") ? (
        <ScenarioDetailsEditor
          slug={ctx.team.slug}
          scenarioId={summary.id}
          name={summary.name}
          materialLabel={summary.materialLabel}
          tags={summary.tags}
          revisions={latest}
        />
      ) : null}
      {number !== latest && !other ? (
        <p role="status" className="mb-3 rounded-md bg-amber-50 px-3 py-2 text-sm text-amber-900">
          You are looking at revision {number}, read-only. The newest is revision {latest}:{" "}
          <Link href={pages.scenario(summary.id)} className="underline">
            open it
          </Link>
          .
        </p>
      ) : null}
      {other ? (
        <p
          role="status"
          className="mb-3 rounded-md bg-verdigris-light px-3 py-2 text-sm text-verdigris-dark"
        >
          Overlay, read-only: the sets of revision {number} and revision {overlay}, labelled “rev N
          · set”, run on revision {number}&apos;s path
          {samePath(current.scenario, other.scenario)
            ? " (both revisions share it)"
            : " (revision " + overlay + " has another path)"}
          .{" "}
          <Link
            href={pages.scenario(summary.id, { rev: number === latest ? undefined : number })}
            className="underline"
          >
            Leave the overlay
          </Link>
        </p>
      ) : null}
      <div className="relative left-1/2 -ml-[min(800px,calc(50vw-1rem))] w-[min(1600px,calc(100vw-2rem))]">
        <ScenarioEditorLoader
          key={`${number}-${overlay ?? ""}`}
          slug={ctx.team.slug}
          scenarioId={summary.id}
          number={number}
          file={file}
          editable={editable}
          teamName={ctx.team.name}
        />
      </div>
      <div className="relative left-1/2 -ml-[min(800px,calc(50vw-1rem))] mt-6 grid w-[min(1600px,calc(100vw-2rem))] gap-4 px-4 lg:grid-cols-2 xl:grid-cols-3">
        <RevisionHistory
          slug={ctx.team.slug}
          scenarioId={summary.id}
          current={number}
          initial={{ items: data.revisions }}
        />
        <ReviewPanel
          slug={ctx.team.slug}
          scenarioId={summary.id}
          number={number}
          me={actor ? { id: actor.id, name: actor.name } : { id: "", name: "you" }}
          canRequest={mayRequest}
          reviewerChoices={reviewerChoices}
          canJudge={can(ctx.role, "review:verdict")}
          canComment={can(ctx.role, "comment:write")}
          maxIncrement={current.scenario.path.legs.reduce((n, l) => n + l.increments, 0)}
        />
        <HandoffPanel
          team={ctx.team.slug}
          scenarioId={summary.id}
          revision={number}
          latest={latestCheck}
        />
        {can(ctx.role, "share:create") ? (
          <ShareLinksPanel slug={ctx.team.slug} scenarioId={summary.id} number={number} />
        ) : null}
      </div>
    </QueryProvider>
  );
}

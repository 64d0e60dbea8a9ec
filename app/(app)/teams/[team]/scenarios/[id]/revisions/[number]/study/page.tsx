import type { Metadata } from "next";
import Link from "next/link";

import { StudyForm } from "@/components/studies/study-form";
import { StudyProgress } from "@/components/studies/study-progress";
import { RevisionCrumb } from "@/components/scenarios/revision-crumb";
import { Cautions } from "@/components/loading-desk/cautions";
import { listStudiesForTeam } from "@/db/queries/studies";
import { loadRevisionPage } from "@/lib/server/access/revision-page";
import { can } from "@/lib/shared/permissions";
import { NUMERIC_PARAMETERS } from "@/lib/server/handoff/studies/schema";
import { isUuid } from "@/lib/shared/uuid";

export const metadata: Metadata = { title: "Parameter study" };

type Params = { team: string; id: string; number: string };

export default async function StudyPage({
  params,
  searchParams,
}: {
  params: Promise<Params>;
  searchParams: Promise<{ study?: string }>;
}) {
  const { team, id, number } = await params;
  const { study } = await searchParams;
  const found = await loadRevisionPage({ team, id, number });
  const { ctx, db, base } = found;
  const recent = await listStudiesForTeam(db, ctx.team.id);
  return (
    <div className="space-y-6">
      <RevisionCrumb
        scenarioName={found.scenario.name}
        scenarioUrl={found.scenarioUrl}
        number={found.revision.number}
      />
      <h1 className="font-display text-2xl font-semibold">Parameter study</h1>
      <p className="text-sm text-ink-soft">
        Runs this revision&apos;s path for many parameter sets on the team&apos;s queue. Every
        set&apos;s answer is the command-line driver&apos;s CSV.
      </p>
      {study && isUuid(study) ? <StudyProgress team={team} studyId={study} /> : null}
      {can(ctx.role, "fit:run") ? (
        <StudyForm
          team={team}
          file={found.revision.file}
          parameters={NUMERIC_PARAMETERS}
          pageUrl={`${base}/study`}
        />
      ) : (
        <p className="text-sm text-ink-faint">Editors and owners submit studies.</p>
      )}
      <section>
        <h2 className="font-display text-lg font-semibold">Recent studies of the team</h2>
        <table className="mt-2 w-full text-sm" data-testid="study-list">
          <thead className="text-left text-ink-faint">
            <tr>
              <th className="py-1">Name</th>
              <th>Sets</th>
              <th>Finished</th>
              <th>Failed</th>
              <th>Submitted</th>
            </tr>
          </thead>
          <tbody>
            {recent.map((s) => (
              <tr key={s.id} className="border-t border-glaze-line">
                <td className="py-1">
                  <Link
                    className="text-verdigris-dark hover:underline"
                    href={`${base}/study?study=${s.id}`}
                  >
                    {s.name}
                  </Link>
                </td>
                <td>{s.total}</td>
                <td>{s.done + s.failed}</td>
                <td>{s.failed}</td>
                <td>{s.createdAt.toISOString().slice(0, 16).replace("T", " ")}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>
      <Cautions />
    </div>
  );
}

import type { Metadata } from "next";
import Link from "next/link";

import { ConformanceResultTable } from "@/components/conformance/result-table";
import { ConformanceUploadForm } from "@/components/conformance/upload-form";
import { CurveChart } from "@/components/records/curve-chart";
import { RevisionCrumb } from "@/components/scenarios/revision-crumb";
import { Cautions } from "@/components/loading-desk/cautions";
import { can } from "@/lib/shared/permissions";
import { conformanceTraces } from "@/lib/server/handoff/conformance/curves";
import {
  listConformanceChecks,
  loadConformanceCheck,
} from "@/lib/server/handoff/conformance/service";
import { orNotFoundOrBusy } from "@/lib/server/access/or-not-found";
import { loadRevisionPage } from "@/lib/server/access/revision-page";
import { parseScenarioFileOrThrow } from "@/lib/server/workspace/parse";

export const metadata: Metadata = { title: "Conformance check" };

type Params = { team: string; id: string; number: string };

export default async function ConformancePage({
  params,
  searchParams,
}: {
  params: Promise<Params>;
  searchParams: Promise<{ check?: string }>;
}) {
  const { team, id, number } = await params;
  const { check } = await searchParams;
  const { ctx, db, scenario, revision, scenarioUrl, base } = await loadRevisionPage({
    team,
    id,
    number,
  });
  const ref = { teamSlug: team, scenarioId: id, number };
  const setIds = parseScenarioFileOrThrow(revision.file).parameterSets.map((s) => s.id);
  const { items } = await listConformanceChecks(db, ctx.actor, ref);
  const loaded = check
    ? await orNotFoundOrBusy(loadConformanceCheck(db, ctx.actor, ref, check))
    : null;
  const shown = loaded?.ok ? loaded.value : null;
  const traces = shown
    ? conformanceTraces(
        shown.curves.history,
        shown.curves.columns,
        shown.curves.rowOf,
        shown.result.quantities.map((q) => q.quantity),
      )
    : null;
  return (
    <div className="space-y-6">
      <RevisionCrumb
        scenarioName={scenario.name}
        scenarioUrl={scenarioUrl}
        number={revision.number}
      />
      <h1 className="font-display text-2xl font-semibold">Conformance check</h1>
      <p className="text-sm text-ink-soft">
        Upload the single-point history your finite-element implementation of this law wrote. Its
        strains are replayed through Craquelure&apos;s driver and every quantity is compared.
      </p>
      {can(ctx.role, "scenario:edit") ? (
        <ConformanceUploadForm
          apiUrl={`/api/v1${base}/conformance`}
          pageUrl={`${base}/conformance`}
          setIds={setIds}
        />
      ) : null}
      <table className="w-full text-sm" data-testid="conformance-checks">
        <thead className="text-left text-ink-faint">
          <tr>
            <th className="py-1">When</th>
            <th>File</th>
            <th>Set</th>
            <th>Verdict</th>
            <th>First increment beyond</th>
            <th>By</th>
          </tr>
        </thead>
        <tbody>
          {items.map((c) => (
            <tr key={c.id} className="border-t border-glaze-line">
              <td className="py-1">
                <Link
                  className="text-verdigris-dark hover:underline"
                  href={`${base}/conformance?check=${c.id}`}
                >
                  {c.createdAt.toISOString().slice(0, 16).replace("T", " ")}
                </Link>
              </td>
              <td>{c.fileName}</td>
              <td>{c.setId}</td>
              <td className={c.passed ? "text-verdigris-dark" : "text-kiln-dark"}>
                {c.passed ? "pass" : "fail"}
              </td>
              <td>{c.firstFailIncrement ?? "—"}</td>
              <td>{c.author ?? "former member"}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {loaded && !loaded.ok ? (
        <p role="alert" className="text-sm text-kiln-dark" data-testid="conformance-busy">
          This check could not be replayed now: {loaded.message}
        </p>
      ) : null}
      {shown && traces ? (
        <section className="space-y-4" aria-label="Selected check">
          <h2 className="font-display text-xl font-semibold">
            {shown.row.fileName}: {shown.result.passed ? "pass" : "fail"}
          </h2>
          <ConformanceResultTable result={shown.result} />
          <a
            className="text-sm text-verdigris-dark hover:underline"
            href={`/api/v1${base}/conformance/${shown.row.id}/csv`}
          >
            Download the comparison (CSV)
          </a>
          <div className="grid gap-6 lg:grid-cols-2">
            <CurveChart
              testId="conformance-curves"
              traces={traces.stresses}
              xTitle="increment"
              yTitle="stress (MPa)"
            />
            {traces.damage.length > 0 ? (
              <CurveChart
                testId="conformance-damage"
                traces={traces.damage}
                xTitle="increment"
                yTitle="damage (–)"
              />
            ) : null}
            <CurveChart
              testId="conformance-differences"
              traces={traces.differences}
              xTitle="increment"
              yTitle="uploaded − Craquelure"
            />
          </div>
        </section>
      ) : null}
      <Cautions />
    </div>
  );
}

import type { Metadata } from "next";
import { redirect } from "next/navigation";
import type { ReactNode } from "react";

import { ConformanceSummary } from "@/components/report/conformance-summary";
import { ParameterTable } from "@/components/report/parameter-table";
import { PageStamp } from "@/components/report/page-stamp";
import { PrintButton } from "@/components/report/print-button";
import { ProvenanceList } from "@/components/report/provenance-list";
import { ReviewSection } from "@/components/report/review-section";
import { SignOff } from "@/components/report/sign-off";
import { SvgChart } from "@/components/report/svg-chart";
import { CAUTION_TEXT } from "@/components/loading-desk/cautions";
import { getDb } from "@/db/index";
import { getActor } from "@/lib/server/accounts/auth/session";
import { BusyNotice } from "@/components/ui/busy-notice";
import { orNotFoundOrBusy } from "@/lib/server/access/or-not-found";
import { loadCalibrationReport } from "@/lib/server/handoff/report/load-report";

export const metadata: Metadata = { title: "Calibration report" };

type Params = { team: string; scenario: string; number: string };

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    // Sections may break across pages (a whole section pushed to page 2 left page 1 empty);
    // a heading never stands alone at the foot of a page.
    <section className="mt-6">
      <h2 className="mb-2 break-after-avoid border-b border-ink font-display text-lg font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}

async function load(p: Params) {
  const actor = await getActor();
  if (!actor)
    redirect(`/sign-in?next=${encodeURIComponent(`/reports/${p.team}/${p.scenario}/${p.number}`)}`);
  return orNotFoundOrBusy(loadCalibrationReport(getDb(), actor, p.team, p.scenario, p.number));
}

/** A print-friendly calibration report of one revision: no navigation, static charts, A4 margins. */
export default async function CalibrationReportPage({ params }: { params: Promise<Params> }) {
  const loaded = await load(await params);
  if (!loaded.ok) {
    return (
      <main id="main">
        <BusyNotice
          title="The report's curves could not be computed now"
          message={loaded.message}
        />
      </main>
    );
  }
  const report = loaded.value;
  const { revision, scenario, file } = report;
  return (
    <main
      id="main"
      className="mx-auto max-w-4xl bg-white px-8 py-6 text-ink print:max-w-none print:p-0"
    >
      <PageStamp
        stamp={`${scenario.name} · revision ${revision.number} · ${report.team.name}`}
        footer="Craquelure calibration report · no design allowable"
      />
      <div className="flex items-start justify-between gap-4">
        <div>
          <p className="text-xs uppercase tracking-wide text-ink-faint">
            Craquelure calibration report
          </p>
          <h1 className="font-display text-2xl font-semibold">{scenario.name}</h1>
          <p className="text-sm text-ink-soft">
            {report.team.name} · revision {revision.number} · saved{" "}
            {revision.createdAt.slice(0, 10)} by {revision.author?.name ?? "former member"}
            {revision.message ? ` · “${revision.message}”` : ""}
          </p>
        </div>
        <PrintButton />
      </div>
      <p role="note" className="mt-4 border border-kiln px-3 py-2 text-sm">
        <strong>Caution.</strong> {CAUTION_TEXT}
      </p>
      <Section title="Review">
        <ReviewSection report={report} />
      </Section>
      <Section title="Parameters">
        <ParameterTable sets={file.parameterSets} />
      </Section>
      <Section title="Provenance, test records and fit quality">
        <ProvenanceList items={report.provenance} />
      </Section>
      <Section title="Key curves">
        <div className="grid grid-cols-2 gap-4 print:block print:space-y-4">
          <SvgChart
            title="Scenario path: σ11 against ε11"
            chart={report.charts.stressStrain}
            xTitle="ε11 (mm/mm)"
            yTitle="σ11 (MPa)"
          />
          <SvgChart
            title="Scenario path: damage against increment"
            chart={report.charts.damage}
            xTitle="increment"
            yTitle="damage d1, d2 (–)"
            seriesPerSet={2}
          />
          <SvgChart
            title="Uniaxial tension along 1 (reference case)"
            chart={report.charts.tension}
            xTitle="ε11 (mm/mm)"
            yTitle="σ11 (MPa)"
          />
        </div>
        <ul className="mt-2 text-xs text-ink-soft">
          {report.statuses.map((s) => (
            <li key={s.setId}>
              Set {s.setId} on the scenario path:{" "}
              {s.failed
                ? `fails (${s.failMode}) at increment ${s.stoppedAtIncrement ?? "—"}`
                : "runs to the end without failure"}
              {s.warnings.length > 0 ? `; ${s.warnings.join("; ")}` : ""}
            </li>
          ))}
          {report.skipped.map((id) => (
            <li key={id}>
              Set {id}: not drawn, its run on this path exceeds the time budget of a page.
            </li>
          ))}
        </ul>
      </Section>
      <Section title="Conformance checks">
        <ConformanceSummary checks={report.checks} />
      </Section>
      <SignOff report={report} />
      <p className="mt-8 border-t border-glaze-line pt-2 text-xs text-ink-faint">
        Generated {new Date().toISOString().slice(0, 16).replace("T", " ")} UTC. {CAUTION_TEXT}
      </p>
    </main>
  );
}

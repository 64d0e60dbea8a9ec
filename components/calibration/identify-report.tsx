"use client";

import type { IdentifyResponse } from "@/lib/server/records/identify-records";

import { LoopCharts } from "./loop-charts";
import { LoopTable } from "./loop-table";
import { ParamsTable } from "./params-table";
import { testTypeWords } from "@/lib/csv/test-type-words";

/** What the identification found: values, loops, the two line plots, R², warnings and notes. */
export function IdentifyReport({ result }: { result: IdentifyResponse }) {
  return (
    <div className="space-y-6" data-testid="identify-report">
      {result.warnings.length > 0 ? (
        <ul className="space-y-1" aria-label="Warnings">
          {result.warnings.map((w) => (
            <li key={w} className="rounded bg-amber-50 px-3 py-2 text-sm text-amber-900">
              {w}
            </li>
          ))}
        </ul>
      ) : null}
      <div className="grid gap-6 md:grid-cols-[auto_1fr]">
        <ParamsTable params={result.params} identified={result.identified} />
        <ul className="list-disc space-y-1 pl-5 text-xs text-ink-soft">
          {result.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      </div>
      {result.records.map((r) =>
        r.loops.length === 0 ? (
          <p key={r.id} className="text-sm">
            {result.recordNames[r.id]}: no loops found ({testTypeWords(r.testType, true)}).
          </p>
        ) : (
          <div key={r.id} className="space-y-3">
            <LoopTable
              loops={r.loops}
              caption={`${result.recordNames[r.id]} (${testTypeWords(r.testType, true)})`}
            />
            <p className="text-sm" data-testid="threshold-r2">
              E0 = {r.E0?.toFixed(0) ?? "—"} MPa; threshold line R² ={" "}
              {r.thresholdR2 === null ? "—" : r.thresholdR2.toFixed(4)}
              {r.validation ? `; replay RMS ${r.validation.rms.toPrecision(3)} MPa` : ""}
            </p>
            {r.testType === "tension-1" ? (
              <LoopCharts loops={r.loops} params={result.params} />
            ) : null}
          </div>
        ),
      )}
    </div>
  );
}

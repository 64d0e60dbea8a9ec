import type { CalibrationReport } from "@/lib/server/handoff/report/load-report";
import { importedVerdictText } from "@/lib/shared/imported-names";

import { verdictWords } from "./verdict-words";

/**
 * The block a reader files: verdict, reviewer, date. An approval here records a review in
 * Craquelure; it is no design allowable and no qualification.
 */
export function SignOff({ report }: { report: CalibrationReport }) {
  const { review } = report.revision;
  const rows: [string, string][] = [
    ["Verdict", verdictWords(review.state)],
    [
      "Reviewer",
      review.importedBy != null
        ? importedVerdictText(review.state, review.importedBy)
        : (review.by?.name ?? "—"),
    ],
    ["Date", review.at ? review.at.slice(0, 10) : "—"],
    ["Revision", `${report.revision.number}, saved ${report.revision.createdAt.slice(0, 10)}`],
  ];
  return (
    <section
      className="mt-8 break-inside-avoid border border-ink p-4 text-sm"
      data-testid="report-sign-off"
      aria-label="Sign-off"
    >
      <h2 className="mb-2 font-display text-lg font-semibold">Sign-off</h2>
      <dl className="grid grid-cols-[8rem_1fr] gap-y-1">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="text-ink-soft">{term}</dt>
            <dd className="font-medium">{value}</dd>
          </div>
        ))}
      </dl>
      <p className="mt-3 text-xs text-ink-soft">
        A verdict records the team&apos;s review of these curves. It is no design allowable:
        structural decisions rest with qualified engineers under the applicable codes.
      </p>
    </section>
  );
}

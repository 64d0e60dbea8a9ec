import type { TeamImportSummary } from "@/lib/client/data/team-import-summary";

type Ready = Extract<TeamImportSummary, { ok: true }>;

const TOTAL_ROWS: [keyof Ready["counts"], string][] = [
  ["scenarios", "Scenarios"],
  ["revisions", "Revisions"],
  ["parameterSets", "Parameter sets"],
  ["testRecords", "Test records (with their original files)"],
  ["fits", "Fits"],
  ["comments", "Comments"],
  ["reviews", "Revisions with a review"],
  ["reviewEvents", "Review history entries"],
];

function utc(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;
}

const cell = "border-b border-glaze-line px-2 py-1";

/** What a checked team export will create: totals, then one line per scenario. */
export function TeamImportSummaryView({ summary }: { summary: Ready }) {
  return (
    <div className="space-y-3" data-testid="import-summary">
      <p className="text-sm">
        From team <strong>{summary.from.name}</strong> ({summary.from.slug}), exported{" "}
        {utc(summary.from.exportedAt)}. The import will create:
      </p>
      <table className="text-sm" aria-label="What the import will create">
        <tbody>
          {TOTAL_ROWS.map(([key, label]) => (
            <tr key={key}>
              <th scope="row" className={`${cell} text-left font-normal`}>
                {label}
              </th>
              <td className={`${cell} text-right tabular-nums`}>{summary.counts[key]}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {summary.scenarios.length > 0 ? (
        <table className="w-full text-sm" aria-label="Scenarios in the file">
          <thead>
            <tr>
              <th scope="col" className={`${cell} text-left`}>
                Scenario
              </th>
              <th scope="col" className={`${cell} text-right`}>
                Revisions
              </th>
              <th scope="col" className={`${cell} text-right`}>
                Comments
              </th>
              <th scope="col" className={`${cell} text-right`}>
                With a review
              </th>
            </tr>
          </thead>
          <tbody>
            {summary.scenarios.map((s, i) => (
              <tr key={i}>
                <td className={cell}>{s.name}</td>
                <td className={`${cell} text-right tabular-nums`}>{s.revisions}</td>
                <td className={`${cell} text-right tabular-nums`}>{s.comments}</td>
                <td className={`${cell} text-right tabular-nums`}>{s.reviews}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {summary.parameterSets.length > 0 ? (
        <p className="text-sm">Parameter sets: {summary.parameterSets.join(", ")}.</p>
      ) : null}
      {summary.testRecords.length > 0 ? (
        <p className="text-sm">Test records: {summary.testRecords.join(", ")}.</p>
      ) : null}
      {summary.notes.length > 0 ? (
        <div className="text-sm" role="note" aria-label="Left out by the import">
          <p>The import will leave out:</p>
          <ul className="list-disc pl-5">
            {summary.notes.map((note, i) => (
              <li key={i}>{note}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}

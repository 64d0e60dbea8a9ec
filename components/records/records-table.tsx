import Link from "next/link";

import type { TestRecordSummary } from "@/db/queries/test-records";
import { testTypeWords } from "@/lib/csv/test-type-words";

/** A team's test records: name, type, specimen, points, author, date. */
export function RecordsTable({ slug, items }: { slug: string; items: TestRecordSummary[] }) {
  if (items.length === 0) {
    return <p className="text-sm text-ink-soft">No test records yet.</p>;
  }
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid="records-table">
        <thead className="text-ink-soft">
          <tr>
            <th className="py-2 pr-3 font-medium">Name</th>
            <th className="py-2 pr-3 font-medium">Type</th>
            <th className="py-2 pr-3 font-medium">Specimen</th>
            <th className="py-2 pr-3 text-right font-medium">Points</th>
            <th className="py-2 pr-3 font-medium">Author</th>
            <th className="py-2 font-medium">Date</th>
          </tr>
        </thead>
        <tbody>
          {items.map((r) => (
            <tr key={r.id} className="border-t border-glaze-line">
              <td className="py-2 pr-3">
                <Link
                  href={`/teams/${slug}/tests/${r.id}`}
                  className="text-verdigris-dark hover:underline"
                >
                  {r.name}
                </Link>
              </td>
              <td className="py-2 pr-3">
                {testTypeWords(r.testType)}, {r.loading}
              </td>
              <td className="py-2 pr-3">{r.specimenId}</td>
              <td className="py-2 pr-3 text-right tabular-nums">
                {r.pointCount.toLocaleString("en")}
              </td>
              <td className="py-2 pr-3">{r.createdBy?.name ?? "former member"}</td>
              <td className="py-2">{r.createdAt.slice(0, 10)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

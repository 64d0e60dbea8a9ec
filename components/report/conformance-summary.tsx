import type { CalibrationReport } from "@/lib/server/handoff/report/load-report";
import { largestDeviation } from "@/lib/shared/conformance-verdict";
import { quantitySymbol } from "@/lib/shared/quantity-symbols";

/** The conformance checks recorded on the revision, newest first, with their worst deviations. */
export function ConformanceSummary({ checks }: { checks: CalibrationReport["checks"] }) {
  if (checks.length === 0)
    return (
      <p className="text-sm text-ink-faint">
        No conformance check has been recorded on this revision.
      </p>
    );
  return (
    <table className="w-full text-sm" data-testid="report-conformance">
      <thead className="text-left">
        <tr className="border-b border-ink">
          <th className="py-1">Date</th>
          <th>File</th>
          <th>Set</th>
          <th>Tolerance</th>
          <th>Largest deviation</th>
          <th>Verdict</th>
        </tr>
      </thead>
      <tbody>
        {checks.map((c) => {
          const worst = largestDeviation(c.result.quantities);
          return (
            <tr key={c.id} className="border-b border-glaze-line">
              <td className="py-0.5">{c.createdAt.toISOString().slice(0, 10)}</td>
              <td>{c.fileName}</td>
              <td>{c.setId}</td>
              <td>
                {c.result.tolerance.stressFraction * 100} % of peak stress,{" "}
                {c.result.tolerance.damage} on damage
              </td>
              <td>
                {worst
                  ? `${quantitySymbol(worst.quantity)}: ${Number(worst.maxAbs.toPrecision(3))}`
                  : "—"}
              </td>
              <td>{c.passed ? "pass" : `fail from increment ${c.firstFailIncrement}`}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

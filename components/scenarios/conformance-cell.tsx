import type { LatestRevisionVerdict } from "@/db/queries/conformance-checks";
import { formatWhen } from "@/lib/client/data/format";

export interface ConformanceCellProps {
  verdict: LatestRevisionVerdict | null;
}

/** The latest revision's newest conformance verdict in the scenarios table; "—" when unchecked. */
export function ConformanceCell({ verdict }: ConformanceCellProps) {
  if (!verdict)
    return (
      <span className="text-ink-faint" data-testid="conformance-verdict">
        —
      </span>
    );
  return (
    <span data-testid="conformance-verdict" title={`Checked ${formatWhen(verdict.checkedAt)}`}>
      <span
        className={
          verdict.passed ? "font-medium text-verdigris-dark" : "font-medium text-kiln-dark"
        }
      >
        {verdict.passed ? "pass" : "fail"}
      </span>
      <span className="block text-xs text-ink-faint">{formatWhen(verdict.checkedAt)}</span>
    </span>
  );
}

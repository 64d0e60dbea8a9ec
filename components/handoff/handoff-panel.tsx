import Link from "next/link";

import { Panel } from "@/components/ui/panel";
import { formatWhen } from "@/lib/client/data/format";
import type { ConformanceVerdict } from "@/lib/shared/conformance-verdict";
import { quantitySymbol } from "@/lib/shared/quantity-symbols";

export interface HandoffPanelProps {
  team: string;
  scenarioId: string;
  revision: number;
  /** The revision's newest conformance check; null when none has been recorded. */
  latest: ConformanceVerdict | null;
}

const LINK = "text-verdigris-dark hover:underline";

function LatestVerdict({ latest }: { latest: ConformanceVerdict | null }) {
  if (!latest) return <p className="text-ink-faint">No conformance check yet.</p>;
  return (
    <p data-testid="handoff-verdict">
      <span
        className={latest.passed ? "font-medium text-verdigris-dark" : "font-medium text-kiln-dark"}
      >
        {latest.passed ? "pass" : `fail from increment ${latest.firstFailIncrement ?? "—"}`}
      </span>{" "}
      <span className="text-ink-soft">
        · {formatWhen(latest.checkedAt)} · {latest.fileName}
        {latest.largest
          ? ` · largest deviation ${quantitySymbol(latest.largest.quantity)}: ${Number(
              latest.largest.maxAbs.toPrecision(3),
            )}`
          : ""}
      </span>
    </p>
  );
}

/**
 * Everything that leaves the team with one revision, in one place: the latest conformance verdict
 * beside the check itself, the parameter study, the printable report and the reference bundle.
 */
export function HandoffPanel({ team, scenarioId, revision, latest }: HandoffPanelProps) {
  const base = `/teams/${team}/scenarios/${scenarioId}/revisions/${revision}`;
  return (
    <Panel id="handoff" title="Hand-off" aside={`rev ${revision}`}>
      <div className="space-y-3 text-sm">
        <LatestVerdict latest={latest} />
        <nav
          aria-label="Hand-off"
          className="flex flex-wrap gap-x-4 gap-y-1"
          data-testid="handoff-links"
        >
          <Link className={LINK} href={`${base}/conformance`}>
            Conformance check
          </Link>
          <Link className={LINK} href={`${base}/study`}>
            Parameter study
          </Link>
          <Link className={LINK} href={`/reports/${team}/${scenarioId}/${revision}`}>
            Calibration report
          </Link>
          <a className={LINK} href={`/api/v1${base}/bundle`}>
            Reference bundle (zip)
          </a>
        </nav>
      </div>
    </Panel>
  );
}

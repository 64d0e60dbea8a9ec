import Link from "next/link";

export interface RevisionHandoffLinksProps {
  team: string;
  scenarioId: string;
  revision: number;
}

const LINK = "text-verdigris-dark hover:underline";

/**
 * The hand-off of one revision: conformance check, parameter study, calibration report and
 * reference bundle. A mount point for the scenario page beside the revision's other actions.
 */
export function RevisionHandoffLinks({ team, scenarioId, revision }: RevisionHandoffLinksProps) {
  const base = `/teams/${team}/scenarios/${scenarioId}/revisions/${revision}`;
  return (
    <nav
      aria-label="Hand-off"
      className="flex flex-wrap gap-x-4 gap-y-1 text-sm"
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
  );
}

import Link from "next/link";

/** "Scenario name · revision N" above every page that belongs to one revision. */
export function RevisionCrumb({
  scenarioName,
  scenarioUrl,
  number,
}: {
  scenarioName: string;
  scenarioUrl: string;
  number: number;
}) {
  return (
    <p className="text-sm">
      <Link className="text-verdigris-dark hover:underline" href={scenarioUrl}>
        {scenarioName}
      </Link>{" "}
      · revision {number}
    </p>
  );
}

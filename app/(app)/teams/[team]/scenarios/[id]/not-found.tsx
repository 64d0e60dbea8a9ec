import Link from "next/link";

// Another team's scenario, a deleted one and a made-up id all read the same.
export default function ScenarioNotFound() {
  return (
    <div className="mx-auto max-w-md space-y-4 py-12 text-center">
      <h1 className="font-display text-2xl font-semibold">Scenario not found</h1>
      <p className="text-sm text-ink-soft">
        There is no such scenario or revision in this team, or you are not one of its members.
      </p>
      <Link href="/teams" className="text-sm text-verdigris-dark hover:underline">
        Back to your teams
      </Link>
    </div>
  );
}

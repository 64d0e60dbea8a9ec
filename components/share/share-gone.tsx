import Link from "next/link";

/** What every dead share link shows: no team, no scenario, no reason. */
export function ShareGone() {
  return (
    <main id="main" className="mx-auto max-w-md space-y-4 px-6 py-16 text-center">
      <h1 className="font-display text-2xl font-semibold">No longer available</h1>
      <p className="text-sm text-ink-soft">
        This link is no longer available. Ask the person who sent it for a new one.
      </p>
      <Link href="/" className="text-sm text-verdigris-dark hover:underline">
        Craquelure
      </Link>
    </main>
  );
}

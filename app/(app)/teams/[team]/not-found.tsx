import Link from "next/link";

import { NOT_FOUND_MESSAGE } from "@/lib/server/access/team-access";

// Unknown team and someone else's team look the same on purpose (lib/server/access/team-access.ts).
export default function TeamNotFound() {
  return (
    <div className="mx-auto max-w-md space-y-4 py-12 text-center">
      <h1 className="font-display text-2xl font-semibold">Team not found</h1>
      <p className="text-sm text-ink-soft">{NOT_FOUND_MESSAGE}</p>
      <Link href="/teams" className="text-sm text-verdigris-dark hover:underline">
        Back to your teams
      </Link>
    </div>
  );
}

import Link from "next/link";

import { can, ROLE_LABELS, type Role } from "@/lib/shared/permissions";

/** Team name, the viewer's role, and links to the team's pages. */
export function TeamNav({ slug, name, role }: { slug: string; name: string; role: Role }) {
  return (
    <div className="mb-8 border-b border-glaze-line pb-4">
      <p className="text-sm text-ink-faint">
        <Link href="/teams" className="hover:underline">
          Teams
        </Link>{" "}
        /
      </p>
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="font-display text-3xl font-semibold">{name}</h1>
        <span
          className="rounded-full bg-verdigris-light px-2 py-0.5 text-xs text-verdigris-dark"
          data-testid="my-role"
        >
          You: {ROLE_LABELS[role]}
        </span>
      </div>
      <nav aria-label="Team" className="mt-3 flex flex-wrap gap-x-4 gap-y-1 text-sm">
        <Link href={`/teams/${slug}`} className="text-verdigris-dark hover:underline">
          Overview
        </Link>
        <Link href={`/teams/${slug}/scenarios`} className="text-verdigris-dark hover:underline">
          Scenarios
        </Link>
        <Link
          href={`/teams/${slug}/parameter-sets`}
          className="text-verdigris-dark hover:underline"
        >
          Parameter sets
        </Link>
        <Link href={`/teams/${slug}/tests`} className="text-verdigris-dark hover:underline">
          Test records
        </Link>
        <Link href={`/teams/${slug}/fits`} className="text-verdigris-dark hover:underline">
          Fits
        </Link>
        <Link href={`/teams/${slug}/members`} className="text-verdigris-dark hover:underline">
          Members
        </Link>
        <Link href={`/teams/${slug}/audit`} className="text-verdigris-dark hover:underline">
          Audit log
        </Link>
        {can(role, "team:rename") ? (
          <Link href={`/teams/${slug}/settings`} className="text-verdigris-dark hover:underline">
            Settings
          </Link>
        ) : null}
      </nav>
    </div>
  );
}

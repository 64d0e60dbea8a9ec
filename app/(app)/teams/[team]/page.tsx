import type { Metadata } from "next";
import Link from "next/link";

import { Card } from "@/components/ui/card";
import { getDb } from "@/db/index";
import { requireTeamRole } from "@/lib/server/access/guard";
import { can, ROLE_LABELS } from "@/lib/shared/permissions";
import { listAwaitingReview } from "@/db/queries/awaiting-review";
import { listMembers } from "@/db/queries/teams";

import { AwaitingReviewCard } from "./awaiting-review-card";
import { TeamNav } from "./team-nav";

export const metadata: Metadata = { title: "Team" };

export default async function TeamHomePage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  const ctx = await requireTeamRole(slug, "team:read");
  const mayJudge = can(ctx.role, "review:verdict");
  const [members, awaiting] = await Promise.all([
    listMembers(getDb(), ctx.team.id),
    mayJudge ? listAwaitingReview(getDb(), { teamId: ctx.team.id, userId: ctx.actor.id }) : [],
  ]);
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <div className="grid gap-6 md:grid-cols-2">
        {mayJudge ? <AwaitingReviewCard slug={ctx.team.slug} items={awaiting} /> : null}
        <Card title="Scenarios" id="scenarios">
          <p className="text-sm text-ink-soft">
            Saved paths and parameter sets, with their revisions and reviews.
          </p>
          <Link
            href={`/teams/${ctx.team.slug}/scenarios`}
            className="mt-3 inline-block text-sm text-verdigris-dark hover:underline"
          >
            Scenarios
          </Link>
        </Card>
        <Card title="Parameter sets" id="parameter-sets">
          <p className="text-sm text-ink-soft">
            The team&apos;s library of named values, typed in, fitted or derived.
          </p>
          <Link
            href={`/teams/${ctx.team.slug}/parameter-sets`}
            className="mt-3 inline-block text-sm text-verdigris-dark hover:underline"
          >
            Parameter sets
          </Link>
        </Card>
        <Card title="Test records" id="test-records">
          <p className="text-sm text-ink-soft">
            Uploaded coupon curves and the fits made from them.
          </p>
          <Link
            href={`/teams/${ctx.team.slug}/tests`}
            className="mt-3 inline-block text-sm text-verdigris-dark hover:underline"
          >
            Test records
          </Link>
        </Card>
        <Card title="Members" id="members">
          <ul className="space-y-1 text-sm">
            {members.map((m) => (
              <li key={m.userId} className="flex justify-between">
                <span>{m.name}</span>
                <span className="text-ink-soft">{ROLE_LABELS[m.role]}</span>
              </li>
            ))}
          </ul>
          <Link
            href={`/teams/${ctx.team.slug}/members`}
            className="mt-3 inline-block text-sm text-verdigris-dark hover:underline"
          >
            All members
          </Link>
        </Card>
      </div>
    </>
  );
}

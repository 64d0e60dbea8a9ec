import type { Metadata } from "next";
import Link from "next/link";

import { getDb } from "@/db/index";
import { listFitsForTeam } from "@/db/queries/fits";
import { requireTeamRole } from "@/lib/server/access/guard";
import { can } from "@/lib/shared/permissions";

import { TeamNav } from "../team-nav";

export const metadata: Metadata = { title: "Fits" };

export default async function FitsPage({ params }: { params: Promise<{ team: string }> }) {
  const { team: slug } = await params;
  const ctx = await requireTeamRole(slug, "team:read");
  const items = await listFitsForTeam(getDb(), ctx.team.id);
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <div className="flex items-baseline justify-between">
        <h2 className="font-display text-lg font-semibold">Fits</h2>
        {can(ctx.role, "fit:run") ? (
          <Link
            href={`/teams/${ctx.team.slug}/fits/new`}
            className="text-sm text-verdigris-dark hover:underline"
          >
            New calibration
          </Link>
        ) : null}
      </div>
      {items.length === 0 ? (
        <p className="mt-3 text-sm text-ink-soft">No fits yet.</p>
      ) : (
        <table className="mt-3 w-full text-left text-sm">
          <thead className="text-ink-soft">
            <tr>
              <th className="py-2 font-medium">Parameter set</th>
              <th className="py-2 font-medium">Method</th>
              <th className="py-2 text-right font-medium">Records</th>
              <th className="py-2 font-medium">Author</th>
              <th className="py-2 font-medium">Date</th>
            </tr>
          </thead>
          <tbody>
            {items.map((f) => (
              <tr key={f.id} className="border-t border-glaze-line">
                <td className="py-2">
                  <Link
                    href={`/teams/${ctx.team.slug}/fits/${f.id}`}
                    className="text-verdigris-dark hover:underline"
                  >
                    {f.parameterSetName ?? "(set deleted)"}
                  </Link>
                </td>
                <td className="py-2">{f.method}</td>
                <td className="py-2 text-right">{f.recordIds.length}</td>
                <td className="py-2">{f.createdBy?.name ?? "former member"}</td>
                <td className="py-2">{f.createdAt.slice(0, 10)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";

import { DesignCaution } from "@/components/calibration/design-caution";
import { FitOverlay } from "@/components/calibration/fit-overlay";
import { LoopTable } from "@/components/calibration/loop-table";
import { ParamsTable } from "@/components/calibration/params-table";
import { UncertaintyTable } from "@/components/calibration/uncertainty-table";
import { getDb } from "@/db/index";
import { requireTeamRole } from "@/lib/server/access/guard";
import { isAppError } from "@/lib/shared/errors";
import { can } from "@/lib/shared/permissions";
import { teamPages } from "@/lib/client/data/api-urls";
import { getFit } from "@/lib/server/records/fits";

import { TeamNav } from "../../team-nav";

export const metadata: Metadata = { title: "Fit" };

export default async function FitPage({
  params,
}: {
  params: Promise<{ team: string; id: string }>;
}) {
  const { team: slug, id } = await params;
  const ctx = await requireTeamRole(slug, "team:read");
  const loaded = await getFit(getDb(), ctx.actor, slug, id).catch((e: unknown) => {
    if (isAppError(e)) notFound();
    throw e;
  });
  const { fit, overlay } = loaded;
  const names = Object.fromEntries(overlay.map((o) => [o.id, o.name]));
  return (
    <>
      <TeamNav slug={ctx.team.slug} name={ctx.team.name} role={ctx.role} />
      <h2 className="font-display text-2xl font-semibold">
        Fit → {fit.parameterSetName ?? "(parameter set deleted)"}
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        {fit.method === "identify"
          ? "Identification from the loading loops"
          : "Levenberg–Marquardt refinement"}
        , {fit.createdAt.slice(0, 10)} by {fit.createdBy?.name ?? "former member"}
      </p>
      {fit.parameterSetId && can(ctx.role, "scenario:edit") ? (
        <p className="mt-3">
          <Link
            href={`${teamPages(ctx.team.slug).newScenario}?set=${fit.parameterSetId}`}
            className="inline-block rounded-md bg-verdigris px-3 py-1.5 text-sm text-white hover:bg-verdigris-dark"
          >
            Check in a new scenario
          </Link>{" "}
          <span className="text-sm text-ink-soft">
            tension → unload → compression and growing cycles, paths the coupons did not cover
          </span>
        </p>
      ) : null}
      <div className="mt-4">
        <DesignCaution />
      </div>
      <div className="mt-6 grid gap-6 md:grid-cols-[auto_1fr]">
        <ParamsTable params={fit.params} />
        <div className="space-y-4">
          <FitOverlay curves={overlay} />
          <ul className="text-sm" data-testid="fit-residuals">
            {fit.residuals.map((r) => (
              <li key={r.id}>
                {names[r.id] ?? r.id}: RMS{" "}
                {r.rms < 0 ? "— (not replayable)" : `${r.rms.toPrecision(3)} MPa`} over {r.points}{" "}
                points
              </li>
            ))}
          </ul>
          {fit.warnings.map((w) => (
            <p key={w} className="rounded bg-amber-50 px-3 py-2 text-sm text-amber-900">
              {w}
            </p>
          ))}
        </div>
      </div>
      {fit.uncertainty ? (
        <div className="mt-6">
          <UncertaintyTable uncertainty={fit.uncertainty} law={fit.params.law} />
        </div>
      ) : null}
      {fit.reports.map((r) =>
        r.loops.length > 0 ? (
          <div key={r.id} className="mt-6">
            <LoopTable loops={r.loops} caption={names[r.id] ?? r.id} />
          </div>
        ) : null,
      )}
    </>
  );
}

import "server-only";

import type { Db } from "@/db/client";
import { findFitView, listFitsForTeam, type FitView } from "@/db/queries/fits";
import { replayRecord, canReplay } from "@/lib/calibration/replay";
import type { Actor } from "@/lib/server/accounts/actor";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { notFound, requireUuid } from "@/lib/server/workspace/errors";

import { loadRecordsForFit } from "./load-records";
import { thinForDisplay } from "../../shared/records/stored-points";

export type FitListResponse = { items: FitView[] };

export async function listFits(db: Db, actor: Actor, teamSlug: string) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  return { items: await listFitsForTeam(db, ctx.team.id) };
}

export interface OverlayCurve {
  id: string;
  name: string;
  measured: { x: number[]; y: number[] };
  computed: { x: number[]; y: number[] } | null;
}

/** The fit, and per record that still exists: the measured curve and the law's replay of it. */
export async function getFit(db: Db, actor: Actor, teamSlug: string, id: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "team:read");
  const fit = await findFitView(db, ctx.team.id, requireUuid(id, "fit"));
  if (!fit) throw notFound("fit");
  const present = await loadRecordsForFit(db, ctx.team.id, fit.recordIds).catch(() => []);
  const overlay: OverlayCurve[] = present.map((r) => {
    const { strain, stress } = r.input.points;
    let computed: OverlayCurve["computed"] = null;
    if (canReplay(r.input.testType)) {
      try {
        computed = thinForDisplay(
          strain,
          replayRecord(fit.params, r.input.testType, r.input.points).predicted,
        );
      } catch {
        computed = null; // inadmissible for the driver: shown as "no replay"
      }
    }
    return { id: r.id, name: r.name, measured: thinForDisplay(strain, stress), computed };
  });
  return { fit, overlay };
}
export type FitResponse = Awaited<ReturnType<typeof getFit>>;

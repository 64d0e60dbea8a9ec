import "server-only";

import type { Db } from "@/db/client";
import { insertFit } from "@/db/queries/fits";
import type { RecordReport } from "@/lib/calibration/identify";
import type { RecordResidual } from "@/lib/calibration/refine";
import type { Bounds } from "@/lib/calibration/refine-params";
import type { FitUncertainty } from "@/lib/calibration/uncertainty";
import { planRefinement, refineWarnings } from "@/lib/calibration/refine-plan";
import { canReplay } from "@/lib/calibration/replay";
import type { Actor } from "@/lib/server/accounts/actor";
import { recordAudit } from "@/lib/server/access/audit";
import { can } from "@/lib/shared/permissions";
import { AppError } from "@/lib/shared/errors";
import type { MaterialParams } from "@/lib/mechanics/types";
import { toMaterialParams, type ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { createParameterSet } from "@/lib/server/workspace/parameter-sets";
import { parseWithPath } from "@/lib/server/workspace/parse";

import type { OrientationProvenance } from "@/lib/shared/validations/parameter-sets";
import { saveFitSchema } from "./fit-schema";
import { runIdentify } from "./identify-records";
import { loadRecordsForFit, type LoadedRecord } from "./load-records";
import { fitUncertaintyOf } from "./fit-uncertainty";
import { replayResiduals } from "./replay-residuals";

interface Outcome {
  params: MaterialParams;
  reports: RecordReport[];
  residuals: RecordResidual[];
  warnings: string[];
  options: Record<string, unknown>;
  method: string;
  uncertainty: FitUncertainty | null;
}

async function fitOutcome(
  person: string,
  records: LoadedRecord[],
  data: ReturnType<typeof saveFitSchema.parse>,
): Promise<Outcome> {
  if (data.method === "identify") {
    // The server identifies again: what is saved is what the stored records give, not a claim.
    const result = await runIdentify(person, records, data);
    return {
      params: result.params,
      reports: result.records,
      residuals: await replayResiduals(person, result.params, records),
      warnings: result.warnings,
      options: { law: data.law, modulus: data.modulus, base: data.base ? "given" : "demo" },
      method: "identification from the loading loops (Theil–Sen threshold line)",
      uncertainty: null,
    };
  }
  const params = toMaterialParams(data.params as ParameterSet);
  // The plan is made again from the stored records, so the warnings are not the browser's claim.
  const inputs = records.map((r) => r.input);
  const used = inputs.filter((r) => canReplay(r.testType));
  const plan = planRefinement(used, params, data.free);
  const [residuals, uncertainty] = await Promise.all([
    replayResiduals(person, params, records),
    fitUncertaintyOf(person, params, records, data.free, data.bounds as Bounds | undefined),
  ]);
  return {
    params,
    reports: [],
    residuals,
    uncertainty,
    warnings: refineWarnings(
      inputs.filter((r) => !canReplay(r.testType)),
      plan,
    ),
    options: {
      free: data.free,
      bounds: data.bounds ?? {},
      isotropic: plan.isotropic,
      notInformed: plan.notInformed,
    },
    method: `Levenberg–Marquardt refinement of ${plan.free.join(", ") || "no free parameters"}`,
  };
}

/** The starting values' orientation state, then each oriented coupon's, or nothing. */
function orientationsOf(records: LoadedRecord[], base: OrientationProvenance | undefined) {
  const coupons = records
    .filter((r) => r.couponOrientation !== null)
    .map((r) => ({
      record: `${r.name} (${r.id})`.slice(0, 200),
      cutAngle: r.couponOrientation!.cutAngle,
      layers: r.couponOrientation!.layers,
    }));
  const all = [...(base ? [base] : []), ...coupons];
  return all.length > 0 ? { orientations: all } : {};
}

/**
 * Saves a fit and its result as a new parameter set in one transaction; the set's provenance
 * names the records, the method and the RMS residual of each record (MPa).
 */
export async function saveFit(db: Db, actor: Actor, teamSlug: string, input: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "fit:run");
  if (!can(ctx.role, "parameter-set:edit")) {
    throw new AppError("forbidden:team", "Saving a fit makes a parameter set; you may not.");
  }
  const data = parseWithPath(saveFitSchema, input);
  const records = await loadRecordsForFit(db, ctx.team.id, data.recordIds);
  const out = await fitOutcome(ctx.actor.id, records, data);
  const names = new Map(records.map((r) => [r.id, r.name]));
  const provenance = {
    kind: "fitted" as const,
    records: records.map((r) => `${r.name} (${r.id})`.slice(0, 200)),
    method: out.method,
    residuals: Object.fromEntries(
      out.residuals.map((r) => [`${names.get(r.id)} RMS MPa`.slice(0, 100), r.rms]),
    ),
    // The coupons' tensors travel with the set (team export included), so its frame is traceable.
    ...orientationsOf(records, data.method === "identify" ? data.baseOrientation : undefined),
  };
  return db.transaction(async (tx) => {
    // The workspace service runs inside this transaction (a savepoint): set and fit, or neither.
    const set = await createParameterSet(tx as unknown as Db, actor, teamSlug, {
      name: data.name,
      values: { ...out.params, label: data.name },
      provenance,
    });
    const id = await insertFit(tx, {
      teamId: ctx.team.id,
      recordIds: records.map((r) => r.id),
      method: data.method,
      options: out.options,
      params: out.params,
      reports: out.reports,
      residuals: out.residuals,
      warnings: out.warnings,
      uncertainty: out.uncertainty,
      parameterSetId: set.id,
      createdBy: ctx.actor.id,
    });
    await recordAudit(tx, {
      actorId: ctx.actor.id,
      teamId: ctx.team.id,
      action: "fit.create",
      target: id,
      detail: { method: data.method, records: records.map((r) => r.id), parameterSet: set.id },
    });
    return { id, parameterSetId: set.id, parameterSetName: set.name, residuals: out.residuals };
  });
}

import "server-only";

import type { Db } from "@/db/client";
import { DEMO_PARAMS } from "@/lib/calibration/demo-curves";
import type { IdentifyResult } from "@/lib/calibration/identify";
import { identifiedFrame } from "@/lib/calibration/identify-frame";
import type { Actor } from "@/lib/server/accounts/actor";
import type { MaterialParams } from "@/lib/mechanics/types";
import { toMaterialParams, type ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { authorizeTeam } from "@/lib/server/access/team-access";
import { compute } from "@/lib/server/compute/pool";
import { parseWithPath } from "@/lib/server/workspace/parse";

import { identifyRequestSchema } from "./fit-schema";
import { loadRecordsForFit, type LoadedRecord } from "./load-records";

export type IdentifyResponse = IdentifyResult & {
  recordNames: Record<string, string>;
  base: "given" | "demo";
};

type IdentifyData = ReturnType<typeof identifyRequestSchema.parse>;

/**
 * spec E on loaded records; the base fills what the records do not inform. The identification
 * itself (loops, fits, replays through the driver) runs in the compute pool with `person`'s caps
 * and budget; the notes and the coupons' frame are put together here.
 */
export async function runIdentify(
  person: string,
  records: LoadedRecord[],
  data: IdentifyData,
): Promise<IdentifyResponse> {
  const base: MaterialParams = data.base
    ? toMaterialParams(data.base as ParameterSet)
    : { ...DEMO_PARAMS };
  const result = await compute<IdentifyResult>(
    {
      kind: "identify",
      records: records.map((r) => r.input),
      options: { base, law: data.law, modulus: data.modulus },
    },
    person,
    "identification",
  );
  // The coupons' orientation states fix the damage frame (spec A.5), or say why they cannot.
  const frame = identifiedFrame(
    records.map((r) => ({ name: r.name, couponOrientation: r.couponOrientation })),
  );
  const notes = [
    ...result.notes,
    ...(frame.kind === "frame" ? [frame.note] : []),
    ...(data.base
      ? []
      : [
          "Values no record informs keep the invented demo set's values; give starting values to replace them.",
        ]),
  ];
  return {
    ...result,
    params: frame.kind === "frame" ? { ...result.params, thetaD: frame.thetaD } : result.params,
    identified:
      frame.kind === "frame" && !result.identified.includes("thetaD")
        ? [...result.identified, "thetaD"]
        : result.identified,
    warnings: frame.kind === "warning" ? [...result.warnings, frame.warning] : result.warnings,
    notes,
    recordNames: Object.fromEntries(records.map((r) => [r.id, r.name])),
    base: data.base ? "given" : "demo",
  };
}

/** Identification without saving (fit:run): the page shows it, then the user decides. */
export async function identifyRecords(db: Db, actor: Actor, teamSlug: string, input: unknown) {
  const ctx = await authorizeTeam(db, actor, teamSlug, "fit:run");
  const data = parseWithPath(identifyRequestSchema, input);
  const records = await loadRecordsForFit(db, ctx.team.id, data.recordIds);
  return runIdentify(ctx.actor.id, records, data);
}

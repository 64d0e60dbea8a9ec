/** Test helper: model output of cyclic coupon paths from the driver, as record points. */
import { seededUniform } from "@/lib/calibration/demo-curves";
import type { RecordPoints } from "@/lib/calibration/types";
import { runPath } from "@/lib/mechanics/driver";
import type { ControlKind, Leg, MaterialParams, ResultColumn } from "@/lib/mechanics/types";

type Kind = "tension-1" | "tension-2" | "shear-12" | "equibiaxial";

const SETUP: Record<
  Kind,
  {
    load: ControlKind[];
    unload: ControlKind[];
    at: (v: number) => [number, number, number];
    eps: ResultColumn;
    sig: ResultColumn;
    transverse?: ResultColumn;
  }
> = {
  "tension-1": {
    load: ["strain", "stress", "stress"],
    unload: ["stress", "stress", "stress"],
    at: (v) => [v, 0, 0],
    eps: "eps11",
    sig: "sig11",
    transverse: "eps22",
  },
  "tension-2": {
    load: ["stress", "strain", "stress"],
    unload: ["stress", "stress", "stress"],
    at: (v) => [0, v, 0],
    eps: "eps22",
    sig: "sig22",
    transverse: "eps11",
  },
  "shear-12": {
    load: ["stress", "stress", "strain"],
    unload: ["stress", "stress", "stress"],
    at: (v) => [0, 0, v],
    eps: "gam12",
    sig: "sig12",
  },
  equibiaxial: {
    load: ["strain", "strain", "stress"],
    unload: ["stress", "stress", "stress"],
    at: (v) => [v, v, 0],
    eps: "eps11",
    sig: "sig11",
  },
};

export interface CyclicOptions {
  increments?: number; // per leg (spec D.18: 60)
  noiseStress?: number; // MPa, half-width of uniform noise
  noiseStrain?: number;
  seed?: number;
  thetaD?: number; // degrees, to replay an off-axis coupon
  finalLoad?: number; // a last strain-controlled leg without unloading (rupture)
}

/** Load to each strain peak, unload to zero stress (spec D.18 path). */
export function cyclicRecord(
  params: MaterialParams,
  kind: Kind,
  peaks: number[],
  o: CyclicOptions = {},
): RecordPoints {
  const n = o.increments ?? 60;
  const s = SETUP[kind];
  const legs: Leg[] = [];
  for (const peak of peaks) {
    legs.push({ control: s.load as Leg["control"], target: s.at(peak), increments: n });
    legs.push({ control: s.unload as Leg["control"], target: [0, 0, 0], increments: n });
  }
  if (o.finalLoad !== undefined)
    legs.push({ control: s.load as Leg["control"], target: s.at(o.finalLoad), increments: n });
  const run = runPath(
    { ...params, thetaD: o.thetaD ?? params.thetaD, onFailure: "continue" },
    legs,
  );
  const random = seededUniform(o.seed ?? 1);
  const take = (col: ResultColumn, half: number) =>
    Float64Array.from(run.columns[col].subarray(0, run.rows), (v) =>
      half > 0 ? v + half * (2 * random() - 1) : v,
    );
  return {
    strain: take(s.eps, o.noiseStrain ?? 0),
    stress: take(s.sig, o.noiseStress ?? 0),
    transverseStrain: s.transverse && take(s.transverse, o.noiseStrain ?? 0),
  };
}

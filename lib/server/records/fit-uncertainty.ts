import "server-only";

import type { Bounds, FittableParam } from "@/lib/calibration/refine-params";
import type { FitUncertainty } from "@/lib/calibration/uncertainty";
import type { MaterialParams } from "@/lib/mechanics/types";
import { compute } from "@/lib/server/compute/pool";

import type { LoadedRecord } from "./load-records";

/**
 * Standard errors, 95 % intervals and correlations of a refinement's free values on the stored
 * records (lib/calibration uncertaintyAt), worked out in the compute pool: p + 2 replays, never
 * on the request thread. What is saved comes from the records, not from the browser's claim.
 */
export function fitUncertaintyOf(
  person: string,
  params: MaterialParams,
  records: LoadedRecord[],
  free: FittableParam[],
  bounds: Bounds | undefined,
): Promise<FitUncertainty | null> {
  return compute<FitUncertainty | null>(
    { kind: "fit-uncertainty", params, records: records.map((r) => r.input), free, bounds },
    person,
    "fit replay",
  );
}

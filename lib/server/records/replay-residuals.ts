import "server-only";

import type { RecordResidual } from "@/lib/calibration/refine";
import type { MaterialParams } from "@/lib/mechanics/types";
import { compute } from "@/lib/server/compute/pool";

import type { LoadedRecord } from "./load-records";

/**
 * RMS stress error (MPa) of each replayable record over its full measured history, replayed in
 * the compute pool (the worker's "replay-residuals" task): the driver never runs on the request
 * thread. Only what a replay reads is sent: the id, the test type and the points.
 */
export function replayResiduals(
  person: string,
  params: MaterialParams,
  records: LoadedRecord[],
): Promise<RecordResidual[]> {
  return compute<RecordResidual[]>(
    {
      kind: "replay-residuals",
      params,
      records: records.map((r) => ({
        id: r.id,
        input: { testType: r.input.testType, points: r.input.points },
      })),
    },
    person,
    "fit replay",
  );
}

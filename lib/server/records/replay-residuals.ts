import "server-only";

import type { RecordResidual } from "@/lib/calibration/refine";
import { canReplay, replayError } from "@/lib/calibration/replay";
import type { MaterialParams } from "@/lib/mechanics/types";

import type { LoadedRecord } from "./load-records";

/** RMS stress error (MPa) of each replayable record over its full measured history. */
export function replayResiduals(params: MaterialParams, records: LoadedRecord[]): RecordResidual[] {
  return records
    .filter((r) => canReplay(r.input.testType))
    .map((r) => {
      const n = r.input.points.strain.length;
      const squared = replayError(params, r.input.testType, r.input.points);
      const rms = Number.isFinite(squared) && n > 0 ? Math.sqrt(squared / n) : -1;
      return { id: r.id, rms, points: n };
    });
}

import "server-only";

/**
 * `POST /api/v1/orientation`: the orientation state of a layer stack (spec A.5) as JSON. The
 * answer repeats the closure and the aligned ply it used so a script can record its provenance.
 */
import {
  orientationRequestSchema,
  toOrientationInput,
} from "@/lib/calibration/micromechanics/orientation-request";
import { orientationState } from "@/lib/calibration/micromechanics/orientation-state";
import { parseWithPath } from "@/lib/server/workspace/parse";
import { API_CAUTION } from "@/lib/server/handoff/openapi/document";

export function computeOrientation(body: unknown) {
  const request = parseWithPath(orientationRequestSchema, body);
  return { ...orientationState(toOrientationInput(request)), caution: API_CAUTION };
}

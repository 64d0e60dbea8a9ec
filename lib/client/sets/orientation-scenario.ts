/**
 * The scenario the orientation state opens in the sandbox (issue 19): the moulded layer's E1, E2,
 * nu12, G12 and damage frame thetaD over the invented demo set's damage parameters, beside the
 * demo set itself for comparison, on the check path of a fitted set. The damage parameters are
 * the demo's until a fit replaces them: the label says so.
 */
import { presetByKey } from "@/lib/client/loading-desk/presets";
import { encodeState, URL_STATE_KEY } from "@/lib/client/loading-desk/url-state";
import type { ScenarioFileJson } from "@/lib/client/loading-desk/scenario-state";
import { setListReducer } from "@/lib/client/loading-desk/set-list";
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";

import { CHECK_PATH_TEXT } from "./check-scenario";
import { toScenarioFile } from "@/lib/client/loading-desk/scenario-state";

export interface OrientationElastic {
  E1: number;
  E2: number;
  nu12: number;
  G12: number;
  thetaD: number;
}

export const ORIENTATION_SET_LABEL = "Orientation state (estimate, demo damage values)";

export function orientationScenario(values: OrientationElastic): ScenarioFileJson {
  const demo = presetByKey("demo-smc")!.params;
  const oriented = {
    ...demo,
    E1: values.E1,
    E2: values.E2,
    nu12: values.nu12,
    G12: values.G12,
    thetaD: values.thetaD,
    frame: "fixed" as const,
    label: ORIENTATION_SET_LABEL,
  };
  const withOriented = setListReducer([], { type: "add", params: oriented });
  const entries = setListReducer(withOriented, { type: "add", params: demo });
  const parsed = parsePathText(CHECK_PATH_TEXT);
  if (!parsed.ok) throw new Error("the check path does not parse");
  return toScenarioFile(
    { name: "Orientation state against the demo set", entries, pathText: CHECK_PATH_TEXT },
    parsed.doc,
  );
}

/** The sandbox address that opens it (the whole scenario rides in the link). */
export function orientationSandboxLink(values: OrientationElastic): string {
  return `/sandbox#${URL_STATE_KEY}=${encodeState(orientationScenario(values))}`;
}

/**
 * The scenario a fit's page opens with "Check in a new scenario": the fitted set on paths the
 * coupon tests did not cover — tension, unload, compression (closure), then growing cycles.
 */
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import { type ScenarioFileJson, toScenarioFile } from "@/lib/client/loading-desk/scenario-state";
import { setListReducer } from "@/lib/client/loading-desk/set-list";

export const CHECK_PATH_TEXT =
  "# tension → unload → compression: does the damage close in compression?\n" +
  "e11=1% in 100\n" +
  "s11=0 in 50     # unload to zero stress\n" +
  "e11=-0.5% in 100\n" +
  "s11=0 in 50\n" +
  "# growing-amplitude cycles: peaks at 0.2 %, 0.4 %, … 1.4 %\n" +
  "repeat 7 grow 1\n  e11=0.2% in 60\n  s11=0 in 60\nend\n";

export function checkScenario(params: Omit<ParameterSet, "id">): ScenarioFileJson {
  const entries = setListReducer([], { type: "add", params });
  const parsed = parsePathText(CHECK_PATH_TEXT);
  if (!parsed.ok) throw new Error("the check path does not parse");
  return toScenarioFile(
    { name: `Check of ${params.label}`, entries, pathText: CHECK_PATH_TEXT },
    parsed.doc,
  );
}

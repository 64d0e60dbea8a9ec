/** What the sandbox opens on: the demo SMC on the growing-cycles template. */
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import { presetByKey } from "./presets";
import { type ScenarioFileJson, toScenarioFile, type LoadingDeskState } from "./scenario-state";
import { setListReducer } from "./set-list";
import { DEFAULT_TEMPLATE_KEY, templateByKey } from "./templates";

export function defaultLoadingDeskState(): LoadingDeskState {
  const template = templateByKey(DEFAULT_TEMPLATE_KEY)!;
  const entries = setListReducer([], { type: "add", params: presetByKey("demo-smc")!.params });
  return { name: "Sandbox — demo SMC, growing cycles", entries, pathText: template.text };
}

/** The same as a scenario file, as the loading desk opens it. */
export function defaultScenario(): ScenarioFileJson {
  const state = defaultLoadingDeskState();
  const parsed = parsePathText(state.pathText);
  if (!parsed.ok) throw new Error("the default template does not parse");
  return toScenarioFile(state, parsed.doc);
}

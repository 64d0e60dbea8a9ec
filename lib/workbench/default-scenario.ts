/** What the sandbox opens on: the demo SMC on the growing-cycles template. */
import { parsePathText } from "@/lib/path-text/parse-path-text";
import { presetByKey } from "./presets";
import type { WorkbenchState } from "./scenario-state";
import { setListReducer } from "./set-list";
import { DEFAULT_TEMPLATE_KEY, templateByKey } from "./templates";

export function defaultWorkbenchState(): WorkbenchState {
  const template = templateByKey(DEFAULT_TEMPLATE_KEY)!;
  if (!parsePathText(template.text).ok) throw new Error("default template does not parse");
  const entries = setListReducer([], { type: "add", params: presetByKey("demo-smc")!.params });
  return { name: "Sandbox — demo SMC, growing cycles", entries, pathText: template.text };
}

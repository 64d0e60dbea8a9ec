import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { defaultScenario } from "@/lib/client/loading-desk/default-scenario";
import { encodeState, URL_STATE_KEY } from "@/lib/client/loading-desk/url-state";

/**
 * A sandbox link that opens one library set on the default path: trying a set needs no
 * scenario and saves nothing. The link carries the values, never an id of the team's data.
 */
export function sandboxLinkForSet(name: string, values: Record<string, unknown>): string {
  const file = defaultScenario();
  const set = { ...values, id: "A", label: name.slice(0, 200) } as ParameterSet;
  const opened = {
    ...file,
    name: `${name} — growing cycles`.slice(0, 500),
    parameterSets: [set],
    desk: { ...file.desk, hidden: [] },
  };
  return `/sandbox#${URL_STATE_KEY}=${encodeState(opened)}`;
}

import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import type { Scenario } from "@/lib/scenario/scenario-schema";
import type { OpenedScenario } from "@/lib/client/loading-desk/scenario-state";

/** One revision's validated file with its number. */
export interface NumberedScenario {
  number: number;
  scenario: Scenario;
}

function relabel(rev: NumberedScenario): ParameterSet[] {
  return rev.scenario.parameterSets.map((set) => ({
    ...set,
    id: `r${rev.number}-${set.id}`.slice(0, 64),
    label: `rev ${rev.number} · ${set.label || set.id}`.slice(0, 200),
  }));
}

/**
 * Two revisions in one desk: the path of `base` (the one being looked at) and the sets of
 * both, each labelled "rev N · set" so the curves say where they come from. When the paths
 * differ, the overlay runs both sets on the base's path; the page says so.
 */
export function overlayRevisions(
  base: NumberedScenario & { desk?: unknown },
  other: NumberedScenario,
): OpenedScenario {
  // The base's path text (repeat blocks and comments) still describes the same legs; the
  // hidden-set list does not apply to the relabelled ids.
  const pathText = (base.desk as { pathText?: unknown } | undefined)?.pathText;
  return {
    desk: typeof pathText === "string" ? { pathText, hidden: [] } : undefined,
    format: base.scenario.format,
    name: `${base.scenario.name} — rev ${base.number} over rev ${other.number}`.slice(0, 500),
    parameterSets: [...relabel(base), ...relabel(other)],
    path: base.scenario.path,
  };
}

export function samePath(a: Scenario, b: Scenario): boolean {
  return JSON.stringify(a.path) === JSON.stringify(b.path);
}

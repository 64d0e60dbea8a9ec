/**
 * The loading desk's state and the scenario file (scenario-file.md), both ways. The file carries the
 * expanded legs (what runs), generators where a repeat block has their shape, and, in a
 * top-level "desk" field (files written before the rename: "workbench") the schema leaves alone, the
 * path text, the hidden sets, the test records drawn over the charts and the chart choices.
 */
import {
  DEFAULT_DESK_CHARTS,
  type DeskCharts,
  type DeskOverlay,
  readDeskCharts,
  readDeskExtras,
  readDeskOverlays,
} from "@/lib/scenario/desk-extras";
import { formatPathText } from "@/lib/scenario/path-text/format-path-text";
import { expandPathDoc, type PathDoc } from "@/lib/scenario/path-text/path-doc";
import { pathTextInCurrentWords } from "@/lib/scenario/path-text/convert-version1";
import { parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import type { PlacedGenerator } from "@/lib/scenario/cycle-generator";
import { type Scenario, SCENARIO_FORMAT } from "@/lib/scenario/scenario-schema";
import { FIXED_CHARTS } from "./chart-defs";
import { repeatToGenerator } from "./repeat-to-generator";
import { entriesFromSets, type SetEntry } from "./set-list";

export interface LoadingDeskState {
  name: string;
  entries: SetEntry[];
  pathText: string;
  /** Test records drawn over the charts, by id; saved with the revision. None when absent. */
  overlays?: DeskOverlay[];
  /** The chart choices; each chart's own axes when absent. */
  charts?: DeskCharts;
}

export interface LoadingDeskFileExtras {
  pathText: string;
  hidden: string[];
  // Optional for files written before they were kept; toScenarioFile always writes both.
  overlays?: DeskOverlay[];
  charts?: DeskCharts;
}

export type ScenarioFileJson = Scenario & { desk: LoadingDeskFileExtras };

/** A validated scenario as the loading desk opens it, with the file's "desk" field if any. */
export type OpenedScenario = Scenario & { desk?: unknown };

export function toScenarioFile(state: LoadingDeskState, doc: PathDoc): ScenarioFileJson {
  const legs = [];
  const generators: PlacedGenerator[] = [];
  for (const item of doc.items) {
    if (item.kind === "leg") {
      legs.push(item.leg);
      continue;
    }
    const generator = repeatToGenerator(item.block);
    if (generator) generators.push({ ...generator, firstLeg: legs.length });
    legs.push(...expandPathDoc({ items: [item] }));
  }
  return {
    format: SCENARIO_FORMAT,
    name: state.name,
    parameterSets: state.entries.map((e) => e.set),
    path: { legs, generators },
    desk: {
      pathText: state.pathText,
      hidden: state.entries.filter((e) => !e.visible).map((e) => e.set.id),
      overlays: state.overlays ?? [],
      charts: state.charts ?? DEFAULT_DESK_CHARTS,
    },
  };
}

function sameLegs(a: unknown, b: unknown): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/**
 * The chart choices a file may hold, kept only where this desk's charts offer them and differ
 * from the chart's own axis: a choice for a chart that no longer exists is dropped.
 */
export function chartsOnThisDesk(charts: DeskCharts): DeskCharts {
  const horizontal: DeskCharts["horizontal"] = {};
  for (const def of FIXED_CHARTS) {
    const choice = charts.horizontal[def.key];
    if (choice && choice !== def.xAxis && def.xChoices.includes(choice)) {
      horizontal[def.key] = choice;
    }
  }
  return { stressStrain: { ...charts.stressStrain }, horizontal };
}

/** Loading-desk state of a validated scenario; `raw` is the file as read, for its "desk" field. */
export function fromScenario(scenario: Scenario, raw: unknown = scenario): LoadingDeskState {
  const extras = readDeskExtras(raw) as Partial<LoadingDeskFileExtras> | undefined;
  const hidden = Array.isArray(extras?.hidden)
    ? extras.hidden.filter((h) => typeof h === "string")
    : [];
  let pathText: string | null = null;
  if (typeof extras?.pathText === "string") {
    // Texts of earlier revisions (e11=1% in 100) open in the current words (ε11=1% over 100).
    const text = pathTextInCurrentWords(extras.pathText);
    const parsed = parsePathText(text);
    // Keep the author's text only if it still says exactly what the legs say.
    if (parsed.ok && sameLegs(expandPathDoc(parsed.doc), scenario.path.legs)) pathText = text;
  }
  pathText ??= formatPathText({ items: scenario.path.legs.map((leg) => ({ kind: "leg", leg })) });
  return {
    name: scenario.name,
    entries: entriesFromSets(scenario.parameterSets, hidden),
    pathText,
    overlays: readDeskOverlays(extras),
    charts: chartsOnThisDesk(readDeskCharts(extras)),
  };
}

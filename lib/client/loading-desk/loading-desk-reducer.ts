/**
 * State of one desk: scenario name, parameter sets, the path (text plus the last valid
 * path object, so the charts keep the last good curves while the text has an error), the set
 * being edited, the test records and chart choices saved with it, and an epoch that changes when the whole state is replaced (import, link).
 */
import { formatPathText } from "@/lib/scenario/path-text/format-path-text";
import type { PathDoc } from "@/lib/scenario/path-text/path-doc";
import { type PathTextError, parsePathText } from "@/lib/scenario/path-text/parse-path-text";
import { DEFAULT_DESK_CHARTS, type DeskCharts, type DeskOverlay } from "@/lib/scenario/desk-extras";
import type { LoadingDeskState } from "./scenario-state";
import { type SetAction, type SetEntry, setListReducer } from "./set-list";

export interface LoadingDeskModel {
  name: string;
  entries: SetEntry[];
  pathText: string;
  doc: PathDoc;
  pathErrors: PathTextError[];
  activeId: string;
  epoch: number;
  overlays: DeskOverlay[];
  charts: DeskCharts;
}

export type LoadingDeskAction =
  | { type: "name"; name: string }
  | { type: "sets"; action: SetAction }
  | { type: "pathText"; text: string }
  | { type: "pathDoc"; doc: PathDoc }
  | { type: "select"; id: string }
  | { type: "overlays"; overlays: DeskOverlay[] }
  | { type: "charts"; charts: DeskCharts }
  | { type: "replace"; state: LoadingDeskState };

export function initModel(state: LoadingDeskState, epoch = 0): LoadingDeskModel {
  const parsed = parsePathText(state.pathText);
  return {
    name: state.name,
    entries: state.entries,
    pathText: state.pathText,
    doc: parsed.ok ? parsed.doc : { items: [] },
    pathErrors: parsed.ok ? [] : parsed.errors,
    activeId: state.entries[0]?.set.id ?? "A",
    epoch,
    overlays: state.overlays ?? [],
    charts: state.charts ?? DEFAULT_DESK_CHARTS,
  };
}

export function loadingDeskReducer(m: LoadingDeskModel, a: LoadingDeskAction): LoadingDeskModel {
  switch (a.type) {
    case "name":
      return { ...m, name: a.name };
    case "sets": {
      const entries = setListReducer(m.entries, a.action);
      const added = entries.find((e) => !m.entries.some((o) => o.set.id === e.set.id));
      const activeId = added
        ? added.set.id
        : entries.some((e) => e.set.id === m.activeId)
          ? m.activeId
          : entries[0].set.id;
      return { ...m, entries, activeId };
    }
    case "pathText": {
      const parsed = parsePathText(a.text);
      if (!parsed.ok) return { ...m, pathText: a.text, pathErrors: parsed.errors };
      return { ...m, pathText: a.text, doc: parsed.doc, pathErrors: [] };
    }
    case "pathDoc":
      return { ...m, doc: a.doc, pathText: formatPathText(a.doc), pathErrors: [] };
    case "select":
      return m.entries.some((e) => e.set.id === a.id) ? { ...m, activeId: a.id } : m;
    case "overlays":
      return { ...m, overlays: a.overlays };
    case "charts":
      return { ...m, charts: a.charts };
    case "replace":
      return initModel(a.state, m.epoch + 1);
  }
}

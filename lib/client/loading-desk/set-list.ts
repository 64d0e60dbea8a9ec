/**
 * The sandbox's list of parameter sets: up to six, each with a colour and a visibility flag.
 * Pure reducer; ids are "A", "B", … as in the scenario file.
 */
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";
import { MAX_SETS, SET_COLORS, nextColor } from "./set-colors";

export interface SetEntry {
  set: ParameterSet;
  color: string;
  visible: boolean;
}

export type SetAction =
  | { type: "add"; params: Omit<ParameterSet, "id"> }
  | { type: "duplicate"; id: string }
  | { type: "rename"; id: string; label: string }
  | { type: "remove"; id: string }
  | { type: "toggle"; id: string }
  | { type: "update"; id: string; set: Omit<ParameterSet, "id"> }
  | { type: "replace"; entries: SetEntry[] };

/** First free id of "A" … "Z". */
function nextSetId(entries: readonly SetEntry[]): string {
  const used = new Set(entries.map((e) => e.set.id));
  for (let c = 65; c <= 90; c++)
    if (!used.has(String.fromCharCode(c))) return String.fromCharCode(c);
  return `S${entries.length + 1}`;
}

function withNew(entries: SetEntry[], params: Omit<ParameterSet, "id">): SetEntry[] {
  if (entries.length >= MAX_SETS) return entries;
  const set = { ...params, id: nextSetId(entries) } as ParameterSet;
  return [...entries, { set, color: nextColor(entries.map((e) => e.color)), visible: true }];
}

export function setListReducer(entries: SetEntry[], action: SetAction): SetEntry[] {
  switch (action.type) {
    case "add":
      return withNew(entries, action.params);
    case "duplicate": {
      const src = entries.find((e) => e.set.id === action.id);
      if (!src) return entries;
      return withNew(entries, { ...src.set, label: `${src.set.label || src.set.id} (copy)` });
    }
    case "rename":
      return entries.map((e) =>
        e.set.id === action.id ? { ...e, set: { ...e.set, label: action.label } } : e,
      );
    case "remove":
      return entries.length <= 1 ? entries : entries.filter((e) => e.set.id !== action.id);
    case "toggle":
      return entries.map((e) => (e.set.id === action.id ? { ...e, visible: !e.visible } : e));
    case "update":
      return entries.map((e) =>
        e.set.id === action.id
          ? { ...e, set: { ...action.set, id: action.id } as ParameterSet }
          : e,
      );
    case "replace":
      return action.entries;
  }
}

/** Entries for imported sets, colours by position, all visible unless listed in `hidden`. */
export function entriesFromSets(
  sets: readonly ParameterSet[],
  hidden: readonly string[] = [],
): SetEntry[] {
  return sets.slice(0, MAX_SETS).map((set, i) => ({
    set,
    color: SET_COLORS[i],
    visible: !hidden.includes(set.id),
  }));
}

/** Immutable edits of a path object for the table editor. `at` = [item, leg inside a block]. */
import type { ControlKind, Leg } from "@/lib/mechanics/types";
import type { PathDoc, PathItem } from "@/lib/scenario/path-text/path-doc";

export type LegAt = { item: number; leg: number | null };

const NEW_LEG: Leg = {
  control: ["strain", "stress", "stress"],
  target: [0, 0, 0],
  increments: 50,
};

export function updateLeg(doc: PathDoc, at: LegAt, change: (leg: Leg) => Leg): PathDoc {
  const items = doc.items.map((item, i): PathItem => {
    if (i !== at.item) return item;
    if (item.kind === "leg") return { kind: "leg", leg: change(item.leg) };
    const legs = item.block.legs.map((l, k) => (k === at.leg ? change(l) : l));
    return { kind: "repeat", block: { ...item.block, legs } };
  });
  return { items };
}

export function setComponent(leg: Leg, c: 0 | 1 | 2, control: ControlKind, target: number): Leg {
  const out: Leg = {
    control: [...leg.control],
    target: [...leg.target],
    increments: leg.increments,
  };
  out.control[c] = control;
  out.target[c] = target;
  return out;
}

export function removeLeg(doc: PathDoc, at: LegAt): PathDoc {
  const item = doc.items[at.item];
  if (item.kind === "leg" || item.block.legs.length === 1)
    return { items: doc.items.filter((_, i) => i !== at.item) };
  return updateItem(doc, at.item, {
    kind: "repeat",
    block: { ...item.block, legs: item.block.legs.filter((_, k) => k !== at.leg) },
  });
}

export function updateItem(doc: PathDoc, index: number, item: PathItem): PathDoc {
  return { items: doc.items.map((it, i) => (i === index ? item : it)) };
}

export function moveItem(doc: PathDoc, index: number, by: -1 | 1): PathDoc {
  const j = index + by;
  if (j < 0 || j >= doc.items.length) return doc;
  const items = [...doc.items];
  [items[index], items[j]] = [items[j], items[index]];
  return { items };
}

export function appendLeg(doc: PathDoc, block: number | null): PathDoc {
  if (block === null) return { items: [...doc.items, { kind: "leg", leg: NEW_LEG }] };
  const item = doc.items[block];
  if (item.kind !== "repeat") return doc;
  return updateItem(doc, block, {
    kind: "repeat",
    block: { ...item.block, legs: [...item.block.legs, NEW_LEG] },
  });
}

export function appendRepeat(doc: PathDoc): PathDoc {
  const legs: Leg[] = [
    { control: ["strain", "stress", "stress"], target: [0.002, 0, 0], increments: 50 },
    { control: ["stress", "stress", "stress"], target: [0, 0, 0], increments: 50 },
  ];
  return { items: [...doc.items, { kind: "repeat", block: { count: 5, grow: 1, legs } }] };
}

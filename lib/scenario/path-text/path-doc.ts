/**
 * The editable form of a path: plain legs and repeat blocks. The text notation and the table
 * editor both read and write this object; `expandPathDoc` turns it into the legs the core runs.
 * Voigt order (11, 22, 12) with engineering shear strain g12.
 */
import type { Leg } from "@/lib/mechanics/types";

export interface RepeatBlock {
  /** How many times the block's legs run. */
  count: number;
  /** Cycle k (0-based) multiplies every target by (1 + grow·k). 0 = identical cycles. */
  grow: number;
  legs: Leg[];
}

export type PathItem = { kind: "leg"; leg: Leg } | { kind: "repeat"; block: RepeatBlock };

export interface PathDoc {
  items: PathItem[];
}

/** Same cap as the scenario file (scenario-file.md, validation). */
export const MAX_PATH_INCREMENTS = 1_000_000;

function scaleLeg(leg: Leg, factor: number): Leg {
  return {
    control: [...leg.control],
    target: leg.target.map((v) => (v === 0 ? 0 : v * factor)) as Leg["target"],
    increments: leg.increments,
  };
}

/** The legs of one repeat block, cycle after cycle. */
function expandRepeat(block: RepeatBlock): Leg[] {
  const out: Leg[] = [];
  for (let k = 0; k < block.count; k++) {
    for (const leg of block.legs) out.push(scaleLeg(leg, 1 + block.grow * k));
  }
  return out;
}

/** Every leg of the path, in order. */
export function expandPathDoc(doc: PathDoc): Leg[] {
  return doc.items.flatMap((item) =>
    item.kind === "leg" ? [scaleLeg(item.leg, 1)] : expandRepeat(item.block),
  );
}

/** Increments of one item once expanded. */
function itemIncrements(item: PathItem): number {
  if (item.kind === "leg") return item.leg.increments;
  return item.block.count * item.block.legs.reduce((s, l) => s + l.increments, 0);
}

export function totalIncrements(doc: PathDoc): number {
  return doc.items.reduce((s, item) => s + itemIncrements(item), 0);
}

/**
 * Writes a path object back in the notation, so the table editor and the text stay one object.
 * Directions held at zero stress are left out (that is the notation's default).
 */
import type { Leg } from "@/lib/mechanics/types";
import { componentName, INCREMENTS_WORD } from "./components";
import type { PathDoc } from "./path-doc";

/** Shortest exact form of a number (round-trips through the parser). */
function num(v: number): string {
  return Object.is(v, -0) ? "0" : String(v);
}

function formatLeg(leg: Leg): string {
  const terms: string[] = [];
  for (const i of [0, 1, 2] as const) {
    const free = leg.control[i] === "stress" && leg.target[i] === 0;
    if (!free) terms.push(`${componentName(i, leg.control[i])}=${num(leg.target[i])}`);
  }
  if (terms.length === 0) terms.push(`${componentName(0, "stress")}=0`);
  return `${terms.join(" ")} ${INCREMENTS_WORD} ${leg.increments}`;
}

export function formatPathText(doc: PathDoc): string {
  const lines: string[] = [];
  for (const item of doc.items) {
    if (item.kind === "leg") {
      lines.push(formatLeg(item.leg));
      continue;
    }
    const { count, grow, legs } = item.block;
    lines.push(grow === 0 ? `repeat ${count}` : `repeat ${count} grow ${num(grow)}`);
    for (const leg of legs) lines.push(`  ${formatLeg(leg)}`);
    lines.push("end");
  }
  return lines.join("\n");
}

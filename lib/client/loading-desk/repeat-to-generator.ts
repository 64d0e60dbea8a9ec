/**
 * Stores a repeat block in the scenario file's generator form when it has that shape: cycles on
 * one component, the other two free (zero stress), load → unload (→ reverse → unload) legs with
 * equal increments. Anything else is kept only as the expanded legs plus the notation text.
 */
import type { Leg } from "@/lib/mechanics/types";
import type { CycleComponent, CycleGenerator } from "@/lib/scenario/cycle-generator";
import type { RepeatBlock } from "@/lib/scenario/path-text/path-doc";

const COMPONENTS: CycleComponent[] = ["11", "22", "12"];

/** The single component a leg moves, if the other two are free. */
function movedComponent(leg: Leg): number | null {
  const moved = [0, 1, 2].filter((i) => !(leg.control[i] === "stress" && leg.target[i] === 0));
  if (moved.length === 1) return moved[0];
  return moved.length === 0 ? -1 : null;
}

export function repeatToGenerator(block: RepeatBlock): CycleGenerator | null {
  const { legs } = block;
  if (legs.length !== 2 && legs.length !== 4) return null;
  const n = legs[0].increments;
  if (legs.some((l) => l.increments !== n)) return null;
  const moved = legs.map(movedComponent);
  const c = moved[0];
  if (c === null || c < 0) return null;
  if (moved.some((m) => m !== c && m !== -1)) return null;
  const [load, unload, reverse, back] = legs;
  const same = (a: Leg, b: Leg) => a.control[c] === b.control[c] && a.target[c] === b.target[c];
  if (back && !same(unload, back)) return null;
  if (reverse && movedComponent(reverse) !== c) return null;
  const ramp = (leg: Leg) => ({
    control: leg.control[c],
    first: leg.target[c],
    step: leg.target[c] * block.grow,
  });
  // The generator grows only the load and reverse targets; a moving unload target cannot be kept.
  if (block.grow !== 0 && unload.target[c] !== 0) return null;
  return {
    kind: "cycles",
    component: COMPONENTS[c],
    peak: ramp(load),
    count: block.count,
    increments: n,
    unloadTo: { control: unload.control[c], value: unload.target[c] },
    ...(reverse ? { reverse: ramp(reverse) } : {}),
  };
}

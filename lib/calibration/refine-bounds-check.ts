/**
 * Checks a refinement's free parameters before any replay runs: every box must hold its start
 * value (lower ≤ start ≤ upper) and lie inside the admissible range of spec damage-law.md A.3
 * (the same ranges lib/scenario/parameter-fields.ts writes for people). Each message names the
 * field by its label and says what is wrong, so the user can fix the one box at fault.
 * The joint envelope a·sqrt(Y0) < 1 is checked on the start set only: a box may reach past it,
 * and refine() refuses such trials one by one.
 */
import type { MaterialParams } from "@/lib/mechanics/types";
import { checkParams } from "@/lib/mechanics/validate";
import { labelOf, rangeOf } from "@/lib/scenario/parameter-fields";
import { defaultBounds, type Bounds, type FittableParam } from "./refine-params";

export class RefineBoundsError extends Error {
  constructor(readonly problems: string[]) {
    super(problems.join(" "));
    this.name = "RefineBoundsError";
  }
}

/** Open or closed admissible interval of one parameter (A.3); nu12's depends on E1/E2. */
function admissible(
  name: FittableParam,
  start: MaterialParams,
): { lo: number; hi: number; loOpen: boolean; hiOpen: boolean } {
  switch (name) {
    case "nu12": {
      const limit = Math.sqrt(start.E1 / start.E2); // A.3: |nu12| < sqrt(E1/E2)
      return { lo: -limit, hi: limit, loOpen: true, hiOpen: true };
    }
    case "b":
      return { lo: 0, hi: 1, loOpen: false, hiOpen: false };
    case "k6":
      return { lo: 0, hi: 3, loOpen: false, hiOpen: false };
    case "alpha":
    case "beta":
      return { lo: 0, hi: 0.05, loOpen: false, hiOpen: false };
    default: // moduli, thresholds and slopes: > 0
      return { lo: 0, hi: Infinity, loOpen: true, hiOpen: true };
  }
}

const show = (v: number) => String(Number(v.toPrecision(6)));

/** Every problem of the chosen boxes, in the user's words; empty when refinement may start. */
export function checkRefineBounds(
  start: MaterialParams,
  free: readonly FittableParam[],
  bounds: Bounds = {},
): string[] {
  // The start set itself first (fixed values included: dmax, dcrit, the slopes' envelope).
  const out: string[] = checkParams(start).map((problem) => {
    const [symbol, ...rest] = problem.split(": ");
    return `${labelOf(symbol)}: the start value ${rest.join(": ")}.`;
  });
  for (const name of free) {
    const label = labelOf(name);
    const [lower, upper] = bounds[name] ?? defaultBounds(name, start[name]);
    const value = start[name];
    if (!Number.isFinite(lower) || !Number.isFinite(upper)) {
      out.push(`${label}: give both bounds as numbers.`);
      continue;
    }
    if (lower > upper) {
      out.push(`${label}: the lower bound ${show(lower)} is above the upper bound ${show(upper)}.`);
      continue;
    }
    const range = admissible(name, start);
    const belowRange = range.loOpen ? lower <= range.lo : lower < range.lo;
    const aboveRange = range.hiOpen ? upper >= range.hi : upper > range.hi;
    if (belowRange)
      out.push(
        `${label}: the lower bound ${show(lower)} is outside the admissible range (${rangeOf(name)}).`,
      );
    if (aboveRange)
      out.push(
        `${label}: the upper bound ${show(upper)} is outside the admissible range (${rangeOf(name)}).`,
      );
    if (!Number.isFinite(value)) out.push(`${label}: the start value is not a number.`);
    else if (value < lower || value > upper)
      out.push(
        `${label}: the start value ${show(value)} is outside its bounds [${show(lower)}, ${show(upper)}].`,
      );
  }
  return out;
}

/** Throws a RefineBoundsError naming every problem; refine() calls it before any replay. */
export function assertRefineBounds(
  start: MaterialParams,
  free: readonly FittableParam[],
  bounds?: Bounds,
): void {
  const problems = checkRefineBounds(start, free, bounds);
  if (problems.length > 0) throw new RefineBoundsError(problems);
}

/**
 * What the refined-values table says beside each value (issue 14): moved by the least squares,
 * recomputed from axis 1 under in-plane isotropy, or kept because the chosen records cannot inform
 * it. Values in none of these lists were fixed by the user and keep the table's default word.
 */
import type { FittableParam } from "./refine-params";

export const REFINED = "refined";
const TIED_TO_AXIS_1 = "tied to axis 1";
const NOT_INFORMED = "not informed by these records";

export interface RefineOutcome {
  free: readonly FittableParam[];
  tied: readonly FittableParam[];
  notInformed: readonly FittableParam[];
}

export function refinedValueMarks(outcome: RefineOutcome): Partial<Record<FittableParam, string>> {
  const marks: Partial<Record<FittableParam, string>> = {};
  for (const k of outcome.notInformed) marks[k] = NOT_INFORMED;
  for (const k of outcome.free) marks[k] = REFINED;
  // A follower is never moved on its own: the tie says where its value came from.
  for (const k of outcome.tied) marks[k] = TIED_TO_AXIS_1;
  return marks;
}

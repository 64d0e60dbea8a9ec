/**
 * What the refined-values table says beside each value (issue 14): moved by the least squares,
 * recomputed from axis 1 under in-plane isotropy, or kept because the chosen records cannot inform
 * it. A value the identification took from the records and the refinement left alone (dcrit, or a
 * value the user fixed) says so: "starting value" would hide that the records gave it. Values in
 * none of these lists keep the table's default word.
 */
import type { MaterialParams } from "@/lib/mechanics/types";
import type { FittableParam } from "./refine-params";

export const REFINED = "refined";
const TIED_TO_AXIS_1 = "tied to axis 1";
const NOT_INFORMED = "not informed by these records";
const IDENTIFIED_KEPT = "identified, kept";

export interface RefineOutcome {
  free: readonly FittableParam[];
  tied: readonly FittableParam[];
  notInformed: readonly FittableParam[];
}

export function refinedValueMarks(
  outcome: RefineOutcome,
  /** What the identification took from the records (its `identified` list). */
  identified: readonly (keyof MaterialParams)[] = [],
): Partial<Record<keyof MaterialParams, string>> {
  const marks: Partial<Record<keyof MaterialParams, string>> = {};
  for (const k of identified) marks[k] = IDENTIFIED_KEPT;
  for (const k of outcome.notInformed) marks[k] = NOT_INFORMED;
  for (const k of outcome.free) marks[k] = REFINED;
  // A follower is never moved on its own: the tie says where its value came from.
  for (const k of outcome.tied) marks[k] = TIED_TO_AXIS_1;
  return marks;
}

/**
 * Which values a refinement may move (issue 14, honest identifiability). Two rules, both decided
 * before any replay:
 * - In-plane isotropy (spec B.5: E1 = E2 and G12 = E1/(2(1 + nu12)) to 1e-6 relative; with the
 *   damage values copied as identification does, E.6: Y0_2 = Y0_1, a2 = a1, beta = alpha): axis 2
 *   and G12 follow axis 1, so the tie survives refinement with one free value per pair.
 * - A free value the chosen records cannot inform stays at its start value and is reported as
 *   "not informed by these records". Uniaxial records along a damage axis (fixed frame at 0°)
 *   inform only that axis: with the other stresses zero, σ11 = E1(1 − d1)(ε11 − εp11) and
 *   Ybar_1 = Y_1 (B.3, B.4: Y_2 = 0), so E2, nu12, G12, b, k6 and the axis-2 values never enter
 *   the replayed stress. Every other record (shear, biaxial, off-axis, pre-damaged) is taken to
 *   inform every value; the Jacobian check after the fit still names what it could not separate.
 */
import type { TestType } from "@/lib/csv/record-schema";
import type { MaterialParams } from "@/lib/mechanics/types";
import { FITTABLE, type FittableParam } from "./refine-params";
import { labelOf } from "@/lib/scenario/parameter-fields";
import { recordName, type TestRecordInput } from "./types";

/** Follower → leader under in-plane isotropy (G12 follows E1 through E1/(2(1 + nu12))). */
const ISOTROPIC_TIES = {
  E2: "E1",
  Y0_2: "Y0_1",
  a2: "a1",
  beta: "alpha",
  G12: "E1",
} as const satisfies Partial<Record<FittableParam, FittableParam>>;
type Follower = keyof typeof ISOTROPIC_TIES;
const FOLLOWERS = Object.keys(ISOTROPIC_TIES) as Follower[];
const isFollower = (k: FittableParam): k is Follower => k in ISOTROPIC_TIES;

const isotropicShear = (p: MaterialParams) => p.E1 / (2 * (1 + p.nu12));

function close(a: number, b: number, tol: number): boolean {
  return Math.abs(a - b) <= tol * Math.max(Math.abs(a), Math.abs(b), 1e-300);
}

/** The set is in-plane isotropic in the sense above (all five ties hold to `tol` relative). */
export function isIsotropicSet(p: MaterialParams, tol = 1e-6): boolean {
  return (
    close(p.E2, p.E1, tol) &&
    close(p.G12, isotropicShear(p), tol) &&
    close(p.Y0_2, p.Y0_1, tol) &&
    close(p.a2, p.a1, tol) &&
    close(p.beta, p.alpha, tol)
  );
}

/** Axis 2 and G12 recomputed from axis 1. */
export function applyIsotropicTies(p: MaterialParams): MaterialParams {
  return {
    ...p,
    E2: p.E1,
    Y0_2: p.Y0_1,
    a2: p.a1,
    beta: p.alpha,
    G12: isotropicShear(p),
  };
}

const AXIS_1: FittableParam[] = ["E1", "Y0_1", "a1", "alpha"];
const AXIS_2: FittableParam[] = ["E2", "Y0_2", "a2", "beta"];
const UNIAXIAL: Partial<Record<TestType, FittableParam[]>> = {
  "tension-1": AXIS_1,
  "compression-1": AXIS_1,
  "tension-2": AXIS_2,
};

/** The values one record's replayed stress depends on (see the file comment). */
function informedByRecord(record: TestRecordInput, p: MaterialParams): FittableParam[] {
  const alongAxis = p.frame === "fixed" && p.thetaD % 360 === 0 && !record.orientation;
  const narrow = alongAxis ? UNIAXIAL[record.testType] : undefined;
  return narrow ?? [...FITTABLE];
}

export interface RefinePlan {
  isotropic: boolean;
  free: FittableParam[]; // the values the least squares moves
  tied: FittableParam[]; // followers recomputed from axis 1 (isotropic only)
  notInformed: FittableParam[]; // asked free, kept at the start value
}

export function planRefinement(
  records: TestRecordInput[],
  start: MaterialParams,
  requested: readonly FittableParam[],
  isotropic = isIsotropicSet(start),
): RefinePlan {
  const informed = new Set(records.flatMap((r) => informedByRecord(r, start)));
  const asked = new Set<FittableParam>();
  for (const k of requested) asked.add(isotropic && isFollower(k) ? ISOTROPIC_TIES[k] : k);
  if (isotropic) {
    // A record of a follower informs its leader (tension-2 informs E1 once E2 = E1).
    for (const k of FOLLOWERS) if (informed.has(k)) informed.add(ISOTROPIC_TIES[k]);
    if (informed.has("G12")) informed.add("nu12");
  }
  const inOrder = FITTABLE.filter((k) => asked.has(k));
  return {
    isotropic,
    free: inOrder.filter((k) => informed.has(k)),
    tied: isotropic ? [...FOLLOWERS] : [],
    notInformed: inOrder.filter((k) => !informed.has(k)),
  };
}

/**
 * What the fit did, in words (shown with the result): the records by name, then the warnings.
 */
export function refineNotes(
  records: TestRecordInput[],
  left: TestRecordInput[],
  plan: RefinePlan,
): string[] {
  return [
    `records used: ${records.map(recordName).join(", ") || "none"}`,
    ...refineWarnings(left, plan),
  ];
}

/** What a saved refinement keeps as warnings: records left out, the isotropy tie, values kept. */
export function refineWarnings(left: TestRecordInput[], plan: RefinePlan): string[] {
  const warnings: string[] = [];
  if (left.length > 0)
    warnings.push(
      `left out (this test type cannot be replayed): ${left.map(recordName).join(", ")}`,
    );
  if (plan.isotropic)
    warnings.push(
      "in-plane isotropic: E2 = E1, Y0_2 = Y0_1, a2 = a1, beta = alpha and G12 = E1/(2(1 + nu12)) kept tied",
    );
  if (plan.notInformed.length > 0)
    warnings.push(
      `not informed by these records, kept at the start value: ${plan.notInformed.map(labelOf).join(", ")}`,
    );
  return warnings;
}

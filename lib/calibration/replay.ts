/**
 * Replays a measured strain history through the driver (spec E.11): every sample becomes a leg of
 * one increment with the test direction's strain prescribed and the other stresses held at zero,
 * and the model's stress in that direction is read back sample by sample.
 */
import { runPath } from "@/lib/mechanics/driver";
import { MechanicsInputError } from "@/lib/mechanics/validate";
import type {
  ControlKind,
  Leg,
  MaterialParams,
  ResultColumn,
  RunStatus,
} from "@/lib/mechanics/types";
import type { TestType } from "@/lib/csv/record-schema";
import type { RecordPoints } from "./types";

interface ReplayPlan {
  control: [ControlKind, ControlKind, ControlKind];
  strainAt: (points: RecordPoints, i: number) => [number, number, number];
  output: ResultColumn;
}

const PLANS: Partial<Record<TestType, ReplayPlan>> = {
  "tension-1": {
    control: ["strain", "stress", "stress"],
    strainAt: (p, i) => [p.strain[i], 0, 0],
    output: "sig11",
  },
  "compression-1": {
    control: ["strain", "stress", "stress"],
    strainAt: (p, i) => [p.strain[i], 0, 0],
    output: "sig11",
  },
  "tension-2": {
    control: ["stress", "strain", "stress"],
    strainAt: (p, i) => [0, p.strain[i], 0],
    output: "sig22",
  },
  "shear-12": {
    control: ["stress", "stress", "strain"],
    strainAt: (p, i) => [0, 0, p.strain[i]],
    output: "sig12",
  },
  // Biaxial: the second in-plane strain if recorded, else equibiaxial (ε22 = ε11).
  biaxial: {
    control: ["strain", "strain", "stress"],
    strainAt: (p, i) => [p.strain[i], p.transverseStrain ? p.transverseStrain[i] : p.strain[i], 0],
    output: "sig11",
  },
};

export function canReplay(testType: TestType): boolean {
  return PLANS[testType] !== undefined;
}

export interface ReplayResult {
  predicted: Float64Array; // MPa, one per sample; 0 past an early stop
  status: RunStatus;
  completed: number; // samples the driver reached
}

/**
 * dcrit only flags failure. The replay compares the law's curve with the record over the whole
 * history, so it moves the flag out of reach (just below dmax) and lets the point go on: with the
 * identified dcrit (often the last loop's damage) 'continue' would otherwise jump d to dmax at
 * the last peak and collapse the replayed stress there.
 */
export function replayRecord(
  params: MaterialParams,
  testType: TestType,
  points: RecordPoints,
): ReplayResult {
  const plan = PLANS[testType];
  if (!plan) throw new Error(`replay: no plan for ${testType}`);
  const n = points.strain.length;
  const legs: Leg[] = new Array(n);
  for (let i = 0; i < n; i++) {
    const target = plan.strainAt(points, i);
    legs[i] = {
      control: plan.control,
      target: [
        plan.control[0] === "strain" ? target[0] : 0,
        plan.control[1] === "strain" ? target[1] : 0,
        plan.control[2] === "strain" ? target[2] : 0,
      ],
      increments: 1,
    };
  }
  const result = runPath({ ...params, dcrit: params.dmax - 1e-9, onFailure: "continue" }, legs);
  const column = result.columns[plan.output];
  const predicted = new Float64Array(n);
  const completed = Math.min(n, result.rows - 1);
  for (let i = 0; i < completed; i++) predicted[i] = column[i + 1]; // row 0 is the initial state
  return { predicted, status: result.status, completed };
}

/** Squared stress error of a replay, or Infinity when the trial parameters are inadmissible. */
export function replayError(
  params: MaterialParams,
  testType: TestType,
  points: RecordPoints,
): number {
  let predicted: Float64Array;
  try {
    predicted = replayRecord(params, testType, points).predicted;
  } catch (error) {
    if (error instanceof MechanicsInputError) return Number.POSITIVE_INFINITY;
    throw error;
  }
  let s = 0;
  for (let i = 0; i < predicted.length; i++) s += (predicted[i] - points.stress[i]) ** 2;
  return s;
}

/**
 * Shapes shared by the identification steps (spec E). Units: strain mm/mm, stress MPa, Y MPa.
 * A record's points are in test order (time); index i of every array is one sample.
 */
import type { TestType } from "@/lib/csv/record-schema";

export interface RecordPoints {
  strain: Float64Array; // axial strain of the test direction (engineering shear for shear-12)
  stress: Float64Array; // MPa, same direction
  transverseStrain?: Float64Array; // mm/mm, in-plane across the load
}

export interface TestRecordInput {
  id: string;
  /** What people call the record; notes use it (the id only when no name is given). */
  name?: string;
  testType: TestType;
  points: RecordPoints;
  /** Loop detection works on strain unless the test was load-controlled (spec E.2). */
  control?: "strain" | "stress";
  /** Degrees from damage axis 1 to the load axis (off-axis tension, spec E.8 c). */
  orientation?: number;
  /** transverse-after-damage-1 only: the energy release rate Y1max of the axial pre-damage, MPa. */
  preDamageY1?: number;
}

/** One row of the loop table (spec E.2–E.4). Indices point into the cleaned record. */
export interface LoopRow {
  k: number; // 1-based loop number among accepted loops
  peakIndex: number;
  valleyIndex: number;
  epsMax: number; // mm/mm, raw sample at the peak
  sigMax: number; // MPa, raw sample at the peak
  sigValley: number; // MPa
  partial: boolean; // valley above 0.2·sigMax: unloading stopped early
  E: number; // MPa, unloading modulus (least squares on the fit window)
  epsR: number; // mm/mm, residual strain at zero stress
  r2: number; // of the unloading fit
  seE: number; // MPa, standard error of E
  reloadE: number | null; // MPa, reloading slope on the same stress window, if a reload follows
  chordE: number | null; // MPa, valley→peak chord; reported when unload and reload differ > 10 %
  hysteresis: boolean;
  d: number; // 1 − E/E0
  Y: number; // MPa, sigMax²/(2·E0·(1 − d)²)
  usedInFit: boolean; // d ≥ dmin: part of the threshold/slope line
}

export type Warning =
  | "insufficient loops"
  | "hysteresis"
  | "partial stiffness recovery — model assumes full"
  | "clearly positive intercept: creep/viscoelastic residual strain not modelled"
  | "envelope check failed: a·sqrt(Y0) must be below 1"
  | (string & {});

/** The record as notes name it. */
export const recordName = (record: Pick<TestRecordInput, "id" | "name">): string =>
  record.name ?? record.id;

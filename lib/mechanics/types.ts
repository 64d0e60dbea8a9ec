/**
 * Public types of the numerical core (spec: shared/spec/damage-law.md, scenario-file.md).
 * Units: stress MPa, strain mm/mm, energy density MPa, Y in MPa, angles in degrees at the API.
 * Voigt order everywhere: (11, 22, 12) with engineering shear strain g12 = 2·e12.
 */

/** Evolution law of damage: linear in sqrt(Ybar) (default) or linear in Ybar. */
export type DamageLaw = "sqrtY" | "linY";
/** Damage frame: fixed at thetaD, or locked at damage onset (isotropic S0 only). */
export type DamageFrame = "fixed" | "onset";
export type OnFailure = "stop" | "continue";

/** A complete, validated parameter set (spec A.3). */
export interface MaterialParams {
  E1: number; // MPa
  E2: number; // MPa
  nu12: number; // –
  G12: number; // MPa
  Y0_1: number; // MPa, damage threshold (energy release rate) of family 1
  Y0_2: number; // MPa
  a1: number; // MPa^-0.5 (sqrtY) or MPa^-1 (linY)
  a2: number;
  b: number; // coupling between the two crack families, [0, 1]
  k6: number; // weight of shear traction in crack-family compliance, [0, 3]
  alpha: number; // mm/mm frozen strain per unit open damage, axis 1
  beta: number; // mm/mm, axis 2
  dcrit: number; // damage that flags failure
  dmax: number; // numerical cap on damage
  law: DamageLaw;
  frame: DamageFrame;
  thetaD: number; // degrees, damage-frame angle (fixed frame)
  Xc: number | null; // MPa, compressive strength flag (null = off)
  onFailure: OnFailure;
}

export type ControlKind = "strain" | "stress";

/** One leg of a path: per load-frame component, what is prescribed and its end value. */
export interface Leg {
  control: [ControlKind, ControlKind, ControlKind];
  target: [number, number, number];
  increments: number;
}

/** Output columns, in the command-line contract's order. */
export const RESULT_COLUMNS = [
  "increment",
  "leg",
  "eps11",
  "eps22",
  "gam12",
  "sig11",
  "sig22",
  "sig12",
  "d1",
  "d2",
  "dp1",
  "dp2",
  "epsP11",
  "epsP22",
  "gamP12",
  "Y1",
  "Y2",
  "Ybar1",
  "Ybar2",
  "psi",
  "W",
  "Phi",
  "thetaD",
  "failed",
] as const;

export type ResultColumn = (typeof RESULT_COLUMNS)[number];

/** Struct-of-arrays results; every array has length >= rows (use `rows`). */
export type ResultColumns = Record<ResultColumn, Float64Array>;

export interface RunStatus {
  failed: boolean;
  /** 'dcrit axis 1' | 'dcrit axis 2' | 'limit load' | 'no convergence' | null */
  failMode: string | null;
  /** increment (row index) of the row where the path stopped early, else null */
  stoppedAtIncrement: number | null;
  /** non-fatal notes, e.g. 'compression strength exceeded' */
  warnings: string[];
}

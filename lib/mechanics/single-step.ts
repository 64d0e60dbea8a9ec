/**
 * One local step from a given state, outside the driver: for the tangent finite-difference test
 * (spec D.17), cross-checks and finite-element users. Allocates its result (not for hot loops;
 * a finite-element code should keep one LocalStepper + TangentKernel per material and reuse them).
 */
import { LocalStepper } from "./local-step";
import { compileMaterial } from "./material";
import { initialState, STATE_SIZE } from "./state";
import { TangentKernel } from "./tangent";
import type { ControlKind, MaterialParams } from "./types";
import { checkParams, MechanicsInputError } from "./validate";

export interface SingleStepResult {
  /** false: the step did not converge or broke a post-check (the caller would sub-step) */
  ok: boolean;
  /** the new state (layout: state.ts); equals the input state when !ok */
  state: Float64Array;
  /** consistent tangent C.6 (load frame, strain control, row-major 3×3) */
  tangent: Float64Array;
  /** reduced Newton + fixed-point iterations used */
  iterations: number;
  /** '' or why the step was rejected ('newton', 'delta d', 'frozen flag', 'dissipation') */
  rejection: string;
  /** dissipation increment of the step */
  dPhi: number;
}

/** Mask with bit k set where component k is strain-controlled. */
export function controlMask(control: readonly ControlKind[]): number {
  let mask = 0;
  for (let k = 0; k < 3; k++) if (control[k] === "strain") mask |= 1 << k;
  return mask;
}

/**
 * Runs one local step (no sub-stepping, post-checks as for a normal sub-step) from `state`
 * (default: the virgin state) to `target` (strain where controlled by strain, else stress).
 */
export function localStepFrom(
  params: MaterialParams,
  state: Float64Array | null,
  control: readonly ControlKind[],
  target: readonly number[],
  atMinimum = false,
): SingleStepResult {
  const errors = checkParams(params);
  if (errors.length > 0) throw new MechanicsInputError(errors.join("; "));
  const m = compileMaterial(params);
  const from = state ? Float64Array.from(state) : initialState(params.thetaD);
  if (from.length !== STATE_SIZE)
    throw new MechanicsInputError(`state: length must be ${STATE_SIZE}`);
  const stepper = new LocalStepper(m);
  const to = new Float64Array(STATE_SIZE);
  const ok = stepper.step(from, controlMask(control), Float64Array.from(target), to, atMinimum);
  const pb = stepper.problem;
  const next = ok ? to : from;
  const tangent = new Float64Array(9);
  new TangentKernel(m).compute(next, ok ? pb : { Hf1: 0, Hf2: 0, chi1: 0, chi2: 0 }, tangent);
  return {
    ok,
    state: next,
    tangent,
    iterations: pb.iterations,
    rejection: stepper.rejection,
    dPhi: ok ? stepper.dPhi : 0,
  };
}

/**
 * Mixed-control single-point driver (spec C.7–C.8): legs of linearly interpolated targets, user
 * increments, recursive halving of failed sub-steps down to hmin = 2^-12 of the user increment
 * (run iteratively on the 2^-12 grid), failure modes, energies, output rows per scenario-file.md.
 * Runs in chunks: `advance(n)` performs at most n user increments; all state lives in the object.
 * Numerical trouble never throws: it ends in a failed state with its reason.
 */
import { LocalStepper } from "./local-step";
import { compileMaterial, type Material } from "./material";
import { allocateColumns, RowWriter, sliceColumns } from "./result-columns";
import * as StateLayout from "./state";
import { TangentKernel } from "./tangent";
import type { Leg, MaterialParams, ResultColumns, RunStatus } from "./types";
import { checkLegs, checkParams, MechanicsInputError } from "./validate";

// Bind imported names once: CommonJS transpilation (tsx, vitest) turns every access to an
// imported binding into a getter call, which dominates a per-increment loop.
const { D1, EPS, PHI, PSI, SIG, SIG_D, STATE_SIZE, W, initialState } = StateLayout;

/** Number of halvings allowed below a user increment (hmin = 2^-12, spec C.7). */
export const MAX_LEVEL = 12;
const GRID = 1 << MAX_LEVEL;
/** outcomes of one user increment */
const INCREMENT_DONE = 0;
/** a dcrit failure with onFailure 'stop' ended the path at an accepted sub-step */
const INCREMENT_STOPPED = 1;
/** no convergence / limit load at hmin: the state is the last converged sub-step */
const INCREMENT_FAILED = 2;

export interface PathResult {
  columns: ResultColumns;
  rows: number;
  status: RunStatus;
}

export class PathRun {
  readonly columns: ResultColumns;
  /** rows written so far (row 0 is the initial state) */
  rows = 0;
  readonly status: RunStatus = {
    failed: false,
    failMode: null,
    stoppedAtIncrement: null,
    warnings: [],
  };
  /** true when the path is complete, stopped by a failure, or cancelled */
  done = false;
  readonly totalIncrements: number;
  /** accepted sub-steps so far (diagnostics) */
  subSteps = 0;
  private readonly m: Material;
  private readonly stepper: LocalStepper;
  private readonly tangentKernel: TangentKernel;
  private readonly writer: RowWriter;
  private readonly ctrl: Int32Array;
  private readonly targets: Float64Array;
  private readonly counts: Int32Array;
  private state: Float64Array;
  private cand: Float64Array;
  private leg = 0;
  private inc = 0;
  private readonly start = new Float64Array(3);
  private readonly prev = new Float64Array(3);
  private readonly end = new Float64Array(3);
  private readonly sub = new Float64Array(3);
  private failedAxes = 0;
  /** the accepted sub-step's state just before a break (preallocated) */
  private readonly preBreak = new Float64Array(STATE_SIZE);
  private xcWarned = false;
  private readonly flags = { Hf1: 0, Hf2: 0, chi1: 0, chi2: 0 };
  private readonly ct = new Float64Array(9);

  constructor(params: MaterialParams, legs: readonly Leg[]) {
    const errors = [...checkParams(params), ...checkLegs(legs)];
    if (errors.length > 0) throw new MechanicsInputError(errors.join("; "));
    this.m = compileMaterial(params);
    this.stepper = new LocalStepper(this.m);
    this.tangentKernel = new TangentKernel(this.m);
    this.ctrl = new Int32Array(legs.length);
    this.targets = new Float64Array(3 * legs.length);
    this.counts = new Int32Array(legs.length);
    let total = 0;
    legs.forEach((leg, i) => {
      let mask = 0;
      for (let k = 0; k < 3; k++) {
        if (leg.control[k] === "strain") mask |= 1 << k;
        this.targets[3 * i + k] = leg.target[k];
      }
      this.ctrl[i] = mask;
      this.counts[i] = leg.increments;
      total += leg.increments;
    });
    this.totalIncrements = total;
    this.columns = allocateColumns(total + 1);
    this.writer = new RowWriter(this.columns, this.m);
    this.state = initialState(this.m.thetaDeg);
    this.cand = new Float64Array(STATE_SIZE);
    this.writer.write(0, 0, this.state, 0);
    this.rows = 1;
  }

  /** Performs at most `maxIncrements` user increments; returns how many were written. */
  advance(maxIncrements: number): number {
    let n = 0;
    while (n < maxIncrements && !this.done) {
      if (this.leg >= this.counts.length) {
        this.done = true;
        break;
      }
      this.nextIncrement();
      n++;
    }
    return n;
  }

  /** Stops the run between chunks; the rows written so far stay valid. */
  cancel(): void {
    this.done = true;
  }

  /** Breaks the families in `mask` in the candidate, keeping its pre-break copy. */
  private breakFamilies(c: Float64Array, mask: number): number {
    const pre = this.preBreak;
    for (let k = 0; k < STATE_SIZE; k++) pre[k] = c[k];
    return this.stepper.breakFamilies(c, mask);
  }

  /** Consistent tangent (C.6) of the last accepted sub-step, load frame, row-major 3×3. */
  get tangent(): Float64Array {
    this.tangentKernel.compute(this.state, this.flags, this.ct);
    return this.ct;
  }

  /** A copy of the current material-point state (layout: state.ts). */
  currentState(): Float64Array {
    return this.state.slice();
  }

  result(): PathResult {
    return { columns: this.columns, rows: this.rows, status: this.status };
  }

  /** Rows [from, to) as fresh transferable columns (for chunked hand-over to a UI). */
  sliceRows(from: number, to = this.rows): ResultColumns {
    return sliceColumns(this.columns, from, to);
  }

  private nextIncrement(): void {
    const li = this.leg;
    const mask = this.ctrl[li];
    const n = this.counts[li];
    if (this.inc === 0) {
      // targets start from the converged values at leg start (spec C.1)
      for (let k = 0; k < 3; k++) {
        const v = mask & (1 << k) ? this.state[EPS + k] : this.state[SIG + k];
        this.start[k] = v;
        this.prev[k] = v;
      }
    }
    this.inc++;
    const frac = this.inc / n;
    for (let k = 0; k < 3; k++) {
      const target = this.targets[3 * li + k];
      this.end[k] = this.inc === n ? target : this.start[k] + (target - this.start[k]) * frac;
    }
    const outcome = this.runIncrement(mask);
    const row = this.rows;
    this.writer.write(row, li + 1, this.state, this.status.failed ? 1 : 0);
    this.rows++;
    for (let k = 0; k < 3; k++) this.prev[k] = this.end[k];
    if (this.inc === n) {
      this.leg++;
      this.inc = 0;
    }
    const last = this.leg >= this.counts.length;
    // A failure that ends the path names its row, even on the path's very last increment:
    // readers test `stoppedAtIncrement !== null` to know the path did not run as scripted.
    const stopped = outcome !== INCREMENT_DONE;
    if (stopped || last) {
      this.done = true;
      if (stopped) this.status.stoppedAtIncrement = row;
    }
  }

  /**
   * Sub-steps on the 2^-12 grid of the user increment. Equivalent to the recursive halving of
   * spec C.8: after a success the next attempt is the largest aligned block (the sibling the
   * recursion would try). Failure is checked on every accepted sub-step (spec C.7): with 'stop'
   * the increment ends at the sub-step that reached dcrit (a partial increment). On failure at
   * hmin the state stays the last converged sub-step.
   */
  private runIncrement(mask: number): number {
    let pos = 0;
    let level = 0;
    const sub = this.sub;
    while (pos < GRID) {
      const size = GRID >> level;
      const next = pos + size;
      if (next === GRID) for (let k = 0; k < 3; k++) sub[k] = this.end[k];
      else {
        const f = next / GRID;
        for (let k = 0; k < 3; k++) sub[k] = this.prev[k] + (this.end[k] - this.prev[k]) * f;
      }
      if (this.stepper.step(this.state, mask, sub, this.cand, level === MAX_LEVEL)) {
        if (this.accept()) return INCREMENT_STOPPED;
        pos = next;
        while (level > 0 && (pos & ((GRID >> level) * 2 - 1)) === 0) level--;
      } else if (level === MAX_LEVEL) {
        // failMode keeps the FIRST failure (a limit load after a break does not overwrite it)
        if (this.status.failMode === null) {
          this.status.failMode = mask === 7 ? "no convergence" : "limit load";
        }
        this.status.failed = true;
        return INCREMENT_FAILED;
      } else level++;
    }
    return INCREMENT_DONE;
  }

  /**
   * Commits the candidate sub-step: failure flags, onFailure, energies, warnings. Returns true
   * when a new dcrit failure with onFailure 'stop' ends the path at this sub-step.
   */
  private accept(): boolean {
    const m = this.m;
    const c = this.cand;
    const st = this.state;
    let cap = 0;
    let stop = false;
    for (let i = 0; i < 2; i++) {
      const bit = 1 << i;
      if (c[D1 + i] >= m.dcrit && !(this.failedAxes & bit)) {
        this.failedAxes |= bit;
        if (!this.status.failed) {
          this.status.failed = true;
          this.status.failMode = `dcrit axis ${i + 1}`;
        }
        if (m.continueOnFailure) cap |= bit;
        else stop = true;
      }
    }
    // W by the trapezoid rule, Phi by the midpoint formula (spec C.7)
    let dW = 0;
    for (let k = 0; k < 3; k++) {
      dW += 0.5 * (st[SIG + k] + c[SIG + k]) * (c[EPS + k] - st[EPS + k]);
    }
    c[W] = st[W] + dW;
    c[PHI] = st[PHI] + this.stepper.dPhi;
    if (cap) {
      this.failedAxes |= this.breakFamilies(c, cap);
      // across the break and relaxation (spec C.7): W by the trapezoid, ΔPhi = ΔW − Δpsi
      const pre = this.preBreak;
      let dWb = 0;
      for (let k = 0; k < 3; k++) {
        dWb += 0.5 * (pre[SIG + k] + c[SIG + k]) * (c[EPS + k] - pre[EPS + k]);
      }
      c[W] += dWb;
      c[PHI] += dWb - (c[PSI] - pre[PSI]);
    }
    const pb = this.stepper.problem;
    this.flags.Hf1 = pb.Hf1;
    this.flags.Hf2 = pb.Hf2;
    this.flags.chi1 = pb.chi1;
    this.flags.chi2 = pb.chi2;
    if (!this.xcWarned && m.Xc === m.Xc && (c[SIG_D] < -m.Xc || c[SIG_D + 1] < -m.Xc)) {
      this.xcWarned = true;
      this.status.warnings.push("compression strength exceeded");
    }
    this.state = c;
    this.cand = st;
    this.subSteps++;
    return stop;
  }
}

/** Runs a whole path in one go (convenience for tests, the command line and small paths). */
export function runPath(params: MaterialParams, legs: readonly Leg[]): PathResult {
  const run = new PathRun(params, legs);
  while (!run.done) run.advance(1 << 30);
  return run.result();
}

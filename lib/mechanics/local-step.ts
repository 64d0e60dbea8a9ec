/**
 * One local step of spec C.4–C.5 from a converged state: elastic trial, onset frame (B.8),
 * loading test, frozen-strain flags Hf, reduced Newton (reduced-newton.ts), post-checks.
 * Never mutates `from`; writes the new state into `to` only when the step is accepted.
 */
import * as Evolution from "./evolution";
import type { Material } from "./material";
import { ReducedProblem } from "./reduced-newton";
import * as StateLayout from "./state";

// Bind imported names once: CommonJS transpilation (tsx, vitest) turns every access to an
// imported binding into a getter call, which dominates a per-increment loop.
const {
  BROKEN,
  D1,
  D2,
  DP1,
  DP2,
  EPS,
  EPS_P,
  FRAME_SET,
  PHI,
  PSI,
  REGIME,
  SIG,
  SIG_D,
  TH,
  TH_DEG,
  W,
  Y1,
  Y2,
} = StateLayout;
const { evolutionF, releaseRate } = Evolution;

/** Largest damage increment of one (sub-)step, spec C.5 (never waived). */
export const DELTA_D_MAX = 0.05;

export class LocalStepper {
  readonly problem: ReducedProblem;
  /** dissipation increment of the last accepted step (midpoint formula, spec C.5) */
  dPhi = 0;
  /** why the last step was rejected: '' | 'newton' | 'delta d' | 'frozen flag' | 'dissipation' */
  rejection = "";

  constructor(private readonly m: Material) {
    this.problem = new ReducedProblem(m);
  }

  /**
   * Local step to the prescribed values `tgt` (strain where bit k of `ctrl` is set, else stress).
   * `atMinimum`: the sub-step is already hmin; then only the Δd post-check still applies
   * (decision documented in README: the sign and dissipation checks are waived there).
   */
  step(from: Float64Array, ctrl: number, tgt: Float64Array, to: Float64Array, atMinimum: boolean) {
    const m = this.m;
    const pb = this.problem;
    const s = pb.solver;
    let th = from[TH];
    let thDeg = from[TH_DEG];
    let frameSet = from[FRAME_SET];
    pb.ctrl = ctrl;
    pb.tgt = tgt;
    pb.dn1 = from[D1];
    pb.dn2 = from[D2];
    pb.dpn1 = from[DP1];
    pb.dpn2 = from[DP2];
    pb.Hf1 = 0;
    pb.Hf2 = 0;
    pb.iterations = 0;
    pb.setBroken(from[BROKEN]);
    this.rejection = "";
    s.setAngle(th);
    s.regime = from[REGIME];
    pb.evaluate(pb.dn1, pb.dn2); // elastic trial (C.4.1)
    let loading = pb.F1 > pb.dn1 || pb.F2 > pb.dn2;
    if (m.onsetFrame && frameSet === 0) {
      // C.4.2: before onset the response is frame-free; damage may only start through the onset
      // test in the principal frame (decision: no growth in the unlocked parameter frame).
      loading = false;
      if (this.onsetTriggered()) {
        th = 0.5 * Math.atan2(2 * s.sig[2], s.sig[0] - s.sig[1]);
        thDeg = (th * 180) / Math.PI;
        frameSet = 1;
        s.setAngle(th);
        pb.evaluate(pb.dn1, pb.dn2);
        loading = pb.F1 > pb.dn1 || pb.F2 > pb.dn2;
      }
    }
    if (!loading) {
      pb.chi1 = 0;
      pb.chi2 = 0;
      this.finish(from, to, th, thDeg, frameSet);
      return true;
    }
    // C.4.4: frozen-strain flags from the trial, frozen for the step
    pb.Hf1 = s.sigD[0] > s.tolS ? 1 : 0;
    pb.Hf2 = s.sigD[1] > s.tolS ? 1 : 0;
    const loads = (pb.F1 > pb.dn1 ? 1 : 0) | (pb.F2 > pb.dn2 ? 2 : 0);
    const converged = pb.solveNewton() || pb.solveFixedPoint();
    let dd1 = pb.d1 - pb.dn1;
    let dd2 = pb.d2 - pb.dn2;
    if (!converged || dd1 > DELTA_D_MAX || dd2 > DELTA_D_MAX) {
      // C.5: no step is rejected before the globally convergent bracketing fallback has looked
      // for a root within the Δd limit (Newton may stall at a closure kink, or reach the capped
      // root d = dmax); then with the loading families' frozen flags flipped (1, 2, both)
      if (!this.bracket(loads)) {
        this.rejection = converged ? "delta d" : "newton";
        return false;
      }
      dd1 = pb.d1 - pb.dn1;
      dd2 = pb.d2 - pb.dn2;
    }
    this.dPhi = this.dissipation(from);
    if (!atMinimum) {
      const tol = s.tolS;
      const sd = s.sigD;
      if (
        (dd1 > 0 && (pb.Hf1 === 1 ? sd[0] < -tol : sd[0] > tol)) ||
        (dd2 > 0 && (pb.Hf2 === 1 ? sd[1] < -tol : sd[1] > tol))
      ) {
        this.rejection = "frozen flag";
        return false;
      }
      if (this.dPhi < -1e-12 * (1 + from[W])) {
        this.rejection = "dissipation";
        return false;
      }
    }
    this.finish(from, to, th, thDeg, frameSet);
    return true;
  }

  /**
   * onFailure 'continue' (spec C.7): the families in `mask` BREAK in the accepted state `st`
   * (in place): d_i := dmax, dp_i kept, no further evolution, no coupling into the other
   * family. At the same prescribed values the elastic sub-problem is re-solved, then a surviving
   * family that is now loading relaxes to the smallest root of its residual (scan + bisection,
   * frozen flag of the post-break state, no Δd limit); if that root reaches dcrit it breaks too.
   * Must follow the accepted `step(…, st)` call directly (same control and targets).
   * W and Phi are left to the caller (ΔPhi = ΔW − Δpsi across the break). Returns the new mask.
   */
  breakFamilies(st: Float64Array, mask: number): number {
    const m = this.m;
    const pb = this.problem;
    const s = pb.solver;
    let broken = st[BROKEN] | mask;
    pb.dpn1 = st[DP1];
    pb.dpn2 = st[DP2];
    pb.dn1 = broken & 1 ? m.dmax : st[D1];
    pb.dn2 = broken & 2 ? m.dmax : st[D2];
    pb.Hf1 = 0;
    pb.Hf2 = 0;
    pb.setBroken(broken);
    s.regime = st[REGIME];
    pb.evaluate(pb.dn1, pb.dn2);
    const j = broken === 1 ? 2 : broken === 2 ? 1 : 0;
    if (j !== 0 && (j === 1 ? pb.F1 > pb.dn1 : pb.F2 > pb.dn2)) {
      if (j === 1) pb.Hf1 = s.sigD[0] > s.tolS ? 1 : 0;
      else pb.Hf2 = s.sigD[1] > s.tolS ? 1 : 0;
      const dn = j === 1 ? pb.dn1 : pb.dn2;
      let root = pb.smallestRoot(j, pb.d1, pb.d2, m.dmax - dn, 64);
      if (root !== root) root = m.dmax; // r_j(dmax) ≥ 0 always; guard against round-off only
      if (root >= m.dcrit) {
        // j keeps its open growth up to the root, then breaks like i (no further dp jump)
        pb.evaluate(j === 1 ? root : pb.d1, j === 2 ? root : pb.d2);
        pb.dpn1 = pb.dp1;
        pb.dpn2 = pb.dp2;
        pb.Hf1 = 0;
        pb.Hf2 = 0;
        pb.dn1 = m.dmax;
        pb.dn2 = m.dmax;
        broken = 3;
        pb.setBroken(broken);
        pb.evaluate(m.dmax, m.dmax);
      } else pb.evaluate(j === 1 ? root : pb.d1, j === 2 ? root : pb.d2);
    }
    this.finish(st, st, st[TH], st[TH_DEG], st[FRAME_SET]);
    return broken;
  }

  /**
   * Bracketing fallback of C.5 with the trial's frozen flags, then with the flags of the loading
   * families (`loads`, bit mask) flipped: family 1, family 2, both. True when a root within
   * Δd ≤ DELTA_D_MAX was found (the problem is left evaluated there).
   */
  private bracket(loads: number): boolean {
    const pb = this.problem;
    const hf1 = pb.Hf1;
    const hf2 = pb.Hf2;
    for (let flip = 0; flip < 4; flip++) {
      if ((flip & loads) !== flip) continue;
      pb.Hf1 = flip & 1 ? 1 - hf1 : hf1;
      pb.Hf2 = flip & 2 ? 1 - hf2 : hf2;
      if (pb.solveBracketing(DELTA_D_MAX)) return true;
    }
    pb.Hf1 = hf1;
    pb.Hf2 = hf2;
    return false;
  }

  /** Onset test of B.8 / C.4.2 on the trial stress in its principal frame (d = 0, s12 = 0). */
  private onsetTriggered(): boolean {
    const m = this.m;
    const sig = this.problem.solver.sig;
    const c = 0.5 * (sig[0] + sig[1]);
    const R = Math.hypot(0.5 * (sig[0] - sig[1]), sig[2]);
    const Y1 = releaseRate(c + R, 0, 0, m.E1, 0);
    const Y2 = releaseRate(c - R, 0, 0, m.E2, 0);
    return evolutionF(m, 1, Y1 + m.b * Y2) > 0 || evolutionF(m, 2, m.b * Y1 + Y2) > 0;
  }

  /**
   * Discrete dissipation of the step (spec C.5):
   * Σ ½(Y_i^n + Y_i)·Δd_i + Σ alpha_i·½(s_ii^n + s_ii)·Δdp_i, with the old stress taken in the
   * step's damage frame (the frame only changes at onset, where d^n = 0).
   */
  private dissipation(from: Float64Array): number {
    const m = this.m;
    const pb = this.problem;
    const tm = pb.solver.tm;
    const sd = pb.solver.sigD;
    const a = from[SIG];
    const b = from[SIG + 1];
    const c = from[SIG + 2];
    const sn0 = tm[0] * a + tm[1] * b + tm[2] * c;
    const sn1 = tm[3] * a + tm[4] * b + tm[5] * c;
    const sn2 = tm[6] * a + tm[7] * b + tm[8] * c;
    const Yn1 = releaseRate(sn0, sn2, m.k6, m.E1, pb.dn1);
    const Yn2 = releaseRate(sn1, sn2, m.k6, m.E2, pb.dn2);
    return (
      0.5 * (Yn1 + pb.Y1) * (pb.d1 - pb.dn1) +
      0.5 * (Yn2 + pb.Y2) * (pb.d2 - pb.dn2) +
      m.alpha * 0.5 * (sn0 + sd[0]) * (pb.dp1 - pb.dpn1) +
      m.beta * 0.5 * (sn1 + sd[1]) * (pb.dp2 - pb.dpn2)
    );
  }

  /** Writes the evaluated point into `to` (work W and dissipation Phi are the driver's). */
  private finish(from: Float64Array, to: Float64Array, th: number, thDeg: number, fs: number) {
    const pb = this.problem;
    const s = pb.solver;
    if (pb.d1 === pb.dn1 && pb.d2 === pb.dn2) this.dPhi = 0;
    to[D1] = pb.d1;
    to[D2] = pb.d2;
    to[DP1] = pb.dp1;
    to[DP2] = pb.dp2;
    to[TH] = th;
    to[TH_DEG] = thDeg;
    to[FRAME_SET] = fs;
    let psi = 0;
    for (let k = 0; k < 3; k++) {
      to[SIG + k] = s.sig[k];
      to[EPS + k] = s.eps[k];
      to[SIG_D + k] = s.sigD[k];
      to[EPS_P + k] = s.ePL[k];
      psi += s.sig[k] * (s.eps[k] - s.ePL[k]);
    }
    to[PSI] = 0.5 * psi;
    to[Y1] = pb.Y1;
    to[Y2] = pb.Y2;
    to[REGIME] = s.regime;
    to[BROKEN] = pb.broken;
    to[W] = from[W];
    to[PHI] = from[PHI];
  }
}

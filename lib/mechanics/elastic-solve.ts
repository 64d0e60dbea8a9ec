/**
 * Exact elastic sub-problem E(d, dp) of spec C.3 for mixed control: the closure regime
 * o = (o1, o2) (o_i = 1: family i open) is found by an active-set search, previous regime first.
 * Regime code: bit 0 = o1, bit 1 = o2. Control mask: bit k set ⇔ component k strain-controlled.
 */
import type { Material } from "./material";
import * as Rotation from "./rotation";
import * as SmallLinalg from "./small-linalg";

// Bind imported functions once: CommonJS transpilation (tsx, vitest) turns every access to an
// imported binding into a getter call, which dominates a per-increment loop.
const { fillRotation, rotateCompliance, rotateStrainToLoad } = Rotation;
const { invertPrincipal } = SmallLinalg;

/** Spec C.3 order of the remaining regimes: (1,1), (1,0), (0,1), (0,0). */
const REGIME_ORDER = [3, 1, 2, 0];

export class ElasticSolver {
  /** Tm of the current angle (spec B.8) */
  readonly tm = new Float64Array(9);
  /** compliance S_L of the last solved regime */
  readonly sL = new Float64Array(9);
  /** S_L[P,P]⁻¹ embedded in 3×3 (zero outside the strain-controlled block) */
  readonly kPP = new Float64Array(9);
  readonly ePL = new Float64Array(3);
  readonly sig = new Float64Array(3);
  readonly eps = new Float64Array(3);
  readonly sigD = new Float64Array(3);
  regime = 3;
  /** tolS = 1e-9·max(1, ‖sig‖∞) of the last solution (spec C.7) */
  tolS = 1e-9;
  private angle = NaN;
  private identity = true;
  private readonly ePD = new Float64Array(3);

  constructor(private readonly m: Material) {
    this.setAngle(0);
  }

  /** Sets the damage-frame angle (radians); trig only when it changes. */
  setAngle(theta: number): void {
    if (theta === this.angle) return;
    this.angle = theta;
    this.identity = theta === 0;
    fillRotation(theta, this.tm);
  }

  /**
   * Solves for (sig, eps) at damage d, open-growth damage dp; tgt holds the prescribed strain
   * (strain-controlled components) or stress (the others). Returns the accepted regime.
   */
  solve(
    d1: number,
    d2: number,
    dp1: number,
    dp2: number,
    ctrl: number,
    tgt: Float64Array,
    firstRegime: number,
  ): number {
    const m = this.m;
    const w1 = d1 / (1 - d1);
    const w2 = d2 / (1 - d2);
    this.ePD[0] = m.alpha * dp1;
    this.ePD[1] = m.beta * dp2;
    this.ePD[2] = 0;
    if (this.identity) {
      this.ePL[0] = this.ePD[0];
      this.ePL[1] = this.ePD[1];
      this.ePL[2] = 0;
    } else rotateStrainToLoad(this.tm, this.ePD, this.ePL);
    let best = firstRegime;
    let bestViolation = Infinity;
    for (let attempt = 0; attempt < 4; attempt++) {
      let reg = firstRegime;
      if (attempt > 0) {
        // the remaining regimes in spec order, skipping the one already tried
        let k = attempt - 1;
        if (REGIME_ORDER.indexOf(firstRegime) <= k) k++;
        reg = REGIME_ORDER[k];
      }
      this.solveRegime(reg, w1, w2, ctrl, tgt);
      const v = this.violation(reg);
      if (v === 0) {
        this.regime = reg;
        return reg;
      }
      if (v < bestViolation) {
        bestViolation = v;
        best = reg;
      }
    }
    // round-off only (spec C.3): take the regime of least violation
    this.solveRegime(best, w1, w2, ctrl, tgt);
    this.regime = best;
    return best;
  }

  private solveRegime(reg: number, w1: number, w2: number, ctrl: number, tgt: Float64Array) {
    const m = this.m;
    const sL = this.sL;
    const a11 = m.invE1 * (1 + (reg & 1) * w1);
    const a22 = m.invE2 * (1 + ((reg >> 1) & 1) * w2);
    const a66 = m.invG12 + m.k6 * (w1 * m.invE1 + w2 * m.invE2);
    if (this.identity) {
      sL[0] = a11;
      sL[1] = m.s12;
      sL[2] = 0;
      sL[3] = m.s12;
      sL[4] = a22;
      sL[5] = 0;
      sL[6] = 0;
      sL[7] = 0;
      sL[8] = a66;
    } else rotateCompliance(this.tm, a11, m.s12, a22, a66, sL);
    const k = this.kPP;
    invertPrincipal(sL, ctrl, k);
    const ePL = this.ePL;
    // r_P = eps_P − eP_L[P] − S_L[P,Q]·sig_Q
    const q0 = ctrl & 1 ? 0 : tgt[0];
    const q1 = ctrl & 2 ? 0 : tgt[1];
    const q2 = ctrl & 4 ? 0 : tgt[2];
    const r0 = ctrl & 1 ? tgt[0] - ePL[0] - sL[1] * q1 - sL[2] * q2 : 0;
    const r1 = ctrl & 2 ? tgt[1] - ePL[1] - sL[3] * q0 - sL[5] * q2 : 0;
    const r2 = ctrl & 4 ? tgt[2] - ePL[2] - sL[6] * q0 - sL[7] * q1 : 0;
    const sig = this.sig;
    sig[0] = ctrl & 1 ? k[0] * r0 + k[1] * r1 + k[2] * r2 : q0;
    sig[1] = ctrl & 2 ? k[3] * r0 + k[4] * r1 + k[5] * r2 : q1;
    sig[2] = ctrl & 4 ? k[6] * r0 + k[7] * r1 + k[8] * r2 : q2;
    const eps = this.eps;
    // prescribed strains are met exactly by construction (spec C.7)
    eps[0] = ctrl & 1 ? tgt[0] : sL[0] * sig[0] + sL[1] * sig[1] + sL[2] * sig[2] + ePL[0];
    eps[1] = ctrl & 2 ? tgt[1] : sL[3] * sig[0] + sL[4] * sig[1] + sL[5] * sig[2] + ePL[1];
    eps[2] = ctrl & 4 ? tgt[2] : sL[6] * sig[0] + sL[7] * sig[1] + sL[8] * sig[2] + ePL[2];
    const sd = this.sigD;
    const tm = this.tm;
    if (this.identity) {
      sd[0] = sig[0];
      sd[1] = sig[1];
      sd[2] = sig[2];
    } else {
      sd[0] = tm[0] * sig[0] + tm[1] * sig[1] + tm[2] * sig[2];
      sd[1] = tm[3] * sig[0] + tm[4] * sig[1] + tm[5] * sig[2];
      sd[2] = tm[6] * sig[0] + tm[7] * sig[1] + tm[8] * sig[2];
    }
    const n = Math.max(1, Math.abs(sig[0]), Math.abs(sig[1]), Math.abs(sig[2]));
    this.tolS = 1e-9 * n;
  }

  /** Sum of sign violations of regime `reg` (0 ⇔ consistent, spec C.3 acceptance test). */
  private violation(reg: number): number {
    const tol = this.tolS;
    let v = 0;
    for (let i = 0; i < 2; i++) {
      const s = this.sigD[i];
      const open = (reg >> i) & 1;
      if (open === 1 && s < -tol) v += -tol - s;
      else if (open === 0 && s > tol) v += s - tol;
    }
    return v;
  }
}

/**
 * The reduced problem of spec C.2/C.5: unknowns d = (d1, d2), residual
 * r_i(d) = d_i − max(d_i^n, F_i(Ybar_i(sig_D(d), d))), with sig from the exact elastic
 * sub-problem (C.3) and dp_i = dp_i^n + Hf_i·(d_i − d_i^n). Semismooth Newton with the
 * consistent Jacobian, backtracking and projection on [d^n, dmax], then a damped fixed-point
 * fallback. Every loop is bounded.
 */
import { ElasticSolver } from "./elastic-solve";
import * as Evolution from "./evolution";
import type { Material } from "./material";

// Bind imported functions once (see local-step.ts: CommonJS getters in hot loops).
const { evolutionF, evolutionSlope, releaseRate } = Evolution;

const TOL_D = 1e-12;
const MAX_NEWTON = 30;
const MAX_HALVINGS = 10;
const MAX_FIXED_POINT = 200;
const MAX_SWEEPS = 60;
const SCAN_INTERVALS = 16;
const MAX_BISECTIONS = 64;

export class ReducedProblem {
  readonly solver: ElasticSolver;
  // step context (set by the caller before solving)
  ctrl = 7;
  tgt: Float64Array = new Float64Array(3);
  dn1 = 0;
  dn2 = 0;
  dpn1 = 0;
  dpn2 = 0;
  Hf1 = 0;
  Hf2 = 0;
  /** broken families (bit mask, spec C.7): no evolution, no coupling into the other family */
  broken = 0;
  /** coupling weights in Ybar_1 = Y_1 + bIn1·Y_2 and Ybar_2 = bIn2·Y_1 + Y_2 (b, or 0 once broken) */
  bIn1 = 0;
  bIn2 = 0;
  // results of the last evaluation
  d1 = 0;
  d2 = 0;
  dp1 = 0;
  dp2 = 0;
  Y1 = 0;
  Y2 = 0;
  Yb1 = 0;
  Yb2 = 0;
  F1 = 0;
  F2 = 0;
  chi1 = 0;
  chi2 = 0;
  r1 = 0;
  r2 = 0;
  iterations = 0;
  /** reduced Jacobian J (row-major 2×2) of the last direction() call */
  readonly jac = new Float64Array(4);
  // Newton direction
  private dd1 = 0;
  private dd2 = 0;
  private readonly vL = new Float64Array(3);
  private readonly g1 = new Float64Array(3);
  private readonly g2 = new Float64Array(3);

  constructor(private readonly m: Material) {
    this.solver = new ElasticSolver(m);
    this.setBroken(0);
  }

  /** Broken families (spec C.7): a broken family's Y no longer enters the other's Ybar. */
  setBroken(mask: number): void {
    this.broken = mask;
    this.bIn1 = mask & 2 ? 0 : this.m.b;
    this.bIn2 = mask & 1 ? 0 : this.m.b;
  }

  /** Solves E(d, dp(d)) and the residual at d (regime search starts from the last one). */
  evaluate(d1: number, d2: number): void {
    const m = this.m;
    const s = this.solver;
    this.d1 = d1;
    this.d2 = d2;
    this.dp1 = this.dpn1 + this.Hf1 * (d1 - this.dn1);
    this.dp2 = this.dpn2 + this.Hf2 * (d2 - this.dn2);
    s.solve(d1, d2, this.dp1, this.dp2, this.ctrl, this.tgt, s.regime);
    const sd = s.sigD;
    const Y1 = releaseRate(sd[0], sd[2], m.k6, m.E1, d1);
    const Y2 = releaseRate(sd[1], sd[2], m.k6, m.E2, d2);
    this.Y1 = Y1;
    this.Y2 = Y2;
    this.Yb1 = Y1 + this.bIn1 * Y2;
    this.Yb2 = this.bIn2 * Y1 + Y2;
    // a broken family no longer evolves: F_i := d_i^n makes r_i = d_i − d_i^n
    const F1 = this.broken & 1 ? this.dn1 : evolutionF(m, 1, this.Yb1);
    const F2 = this.broken & 2 ? this.dn2 : evolutionF(m, 2, this.Yb2);
    this.F1 = F1;
    this.F2 = F2;
    this.chi1 = F1 > this.dn1 && F1 < m.dmax ? 1 : 0;
    this.chi2 = F2 > this.dn2 && F2 < m.dmax ? 1 : 0;
    this.r1 = d1 - (F1 > this.dn1 ? F1 : this.dn1);
    this.r2 = d2 - (F2 > this.dn2 ? F2 : this.dn2);
  }

  /** Newton: from the evaluated point d^n (the trial). Returns true when converged. */
  solveNewton(): boolean {
    const m = this.m;
    let prevRegime = -1;
    for (let it = 0; it < MAX_NEWTON; it++) {
      this.iterations++;
      const regime = this.solver.regime;
      if (Math.max(Math.abs(this.r1), Math.abs(this.r2)) <= TOL_D) {
        if (regime === prevRegime) return true;
        // converged in d but the regime just changed: confirm it at the same d
        prevRegime = regime;
        this.evaluate(this.d1, this.d2);
        continue;
      }
      if (!this.direction()) return false;
      const d1 = this.d1;
      const d2 = this.d2;
      const rn = Math.sqrt(this.r1 * this.r1 + this.r2 * this.r2);
      let lam = 1;
      let accepted = false;
      for (let k = 0; k <= MAX_HALVINGS; k++) {
        this.evaluate(
          clamp(d1 + lam * this.dd1, this.dn1, m.dmax),
          clamp(d2 + lam * this.dd2, this.dn2, m.dmax),
        );
        const rt = Math.sqrt(this.r1 * this.r1 + this.r2 * this.r2);
        if (rt < (1 - 1e-4 * lam) * rn) {
          accepted = true;
          break;
        }
        lam *= 0.5;
      }
      if (!accepted) return false;
      prevRegime = regime;
    }
    return false;
  }

  /** Damped fixed point d ← d + ½(max(d^n, F(Ybar(d))) − d), restarted from d^n (spec C.5). */
  solveFixedPoint(): boolean {
    const m = this.m;
    this.evaluate(this.dn1, this.dn2);
    let prevRegime = -1;
    for (let it = 0; it < MAX_FIXED_POINT; it++) {
      this.iterations++;
      const regime = this.solver.regime;
      if (Math.max(Math.abs(this.r1), Math.abs(this.r2)) <= TOL_D && regime === prevRegime) {
        return true;
      }
      prevRegime = regime;
      this.evaluate(
        clamp(this.d1 - 0.5 * this.r1, this.dn1, m.dmax),
        clamp(this.d2 - 0.5 * this.r2, this.dn2, m.dmax),
      );
    }
    return false;
  }

  /**
   * Globally convergent fallback of spec C.5 for closure kinks, where Newton and the fixed point
   * can stall while the regime flips: alternating sweeps, each family in turn set to the smallest
   * root of its own residual (scan + bisection, the other family's damage held), until both
   * residuals vanish at one point. Roots are only sought within d_i^n + `span` (the Δd limit);
   * false when a family has none there or the sweeps do not settle.
   */
  solveBracketing(span: number): boolean {
    let x1 = this.dn1;
    let x2 = this.dn2;
    let prevRegime = -1;
    for (let sweep = 0; sweep < MAX_SWEEPS; sweep++) {
      this.iterations++;
      this.evaluate(x1, x2);
      if (Math.max(Math.abs(this.r1), Math.abs(this.r2)) <= TOL_D) {
        if (this.solver.regime === prevRegime) return true;
        prevRegime = this.solver.regime;
        continue;
      }
      prevRegime = this.solver.regime;
      if (this.r1 !== 0) {
        x1 = this.smallestRoot(1, x1, x2, span, SCAN_INTERVALS);
        if (x1 !== x1) return false;
      }
      this.evaluate(x1, x2);
      if (this.r2 !== 0) {
        x2 = this.smallestRoot(2, x1, x2, span, SCAN_INTERVALS);
        if (x2 !== x2) return false;
      }
    }
    return false;
  }

  /**
   * Smallest root x ≥ d_i^n of r_i along family i (the other family's damage held), within
   * d_i^n + span (capped at dmax), by a scan of `intervals` equal intervals and bisection; NaN if
   * r_i stays negative there. r_i is continuous in d (G is C¹ in sig, spec B.3), so bisection
   * cannot be fooled by a regime flip. Leaves the problem evaluated at the root.
   */
  smallestRoot(family: number, d1: number, d2: number, span: number, intervals: number): number {
    const dn = family === 1 ? this.dn1 : this.dn2;
    const top = dn + span < this.m.dmax ? dn + span : this.m.dmax;
    let lo = dn;
    let hi = NaN;
    this.evalAlong(family, d1, d2, dn);
    if (this.residual(family) >= 0) return dn;
    for (let k = 1; k <= intervals; k++) {
      const x = k === intervals ? top : dn + ((top - dn) * k) / intervals;
      this.evalAlong(family, d1, d2, x);
      if (this.residual(family) >= 0) {
        hi = x;
        break;
      }
      lo = x;
    }
    if (hi !== hi) return NaN;
    for (let k = 0; k < MAX_BISECTIONS && hi - lo > 1e-16; k++) {
      const mid = 0.5 * (lo + hi);
      if (mid <= lo || mid >= hi) break;
      this.evalAlong(family, d1, d2, mid);
      if (this.residual(family) >= 0) hi = mid;
      else lo = mid;
    }
    this.evalAlong(family, d1, d2, hi);
    return hi;
  }

  private evalAlong(family: number, d1: number, d2: number, x: number): void {
    if (family === 1) this.evaluate(x, d2);
    else this.evaluate(d1, x);
  }

  private residual(family: number): number {
    return family === 1 ? this.r1 : this.r2;
  }

  /**
   * Newton direction Δd = −J⁻¹r with the consistent Jacobian of spec C.5 at the evaluated point.
   * J = I − diag(chi·F')·Bb·(gS·Tm·dsigL_dd + gD). Returns false if J is singular.
   */
  direction(): boolean {
    const m = this.m;
    const s = this.solver;
    const sd = s.sigD;
    const o1 = s.regime & 1;
    const o2 = (s.regime >> 1) & 1;
    const om1 = 1 - this.d1;
    const om2 = 1 - this.d2;
    const c1 = 1 / (m.E1 * om1 * om1);
    const c2 = 1 / (m.E2 * om2 * om2);
    // column j of the damage-frame right-hand side: dS_D/dd_j·sig_D + Hf_j·alpha_j·e_j
    this.stressSensitivity(o1 * sd[0] * c1 + this.Hf1 * m.alpha, 0, m.k6 * sd[2] * c1, this.g1);
    this.stressSensitivity(0, o2 * sd[1] * c2 + this.Hf2 * m.beta, m.k6 * sd[2] * c2, this.g2);
    const g1 = this.g1;
    const g2 = this.g2;
    // gS rows: ∂Y_i/∂sig_D
    const p1 = sd[0] > 0 ? sd[0] : 0;
    const p2 = sd[1] > 0 ? sd[1] : 0;
    const gs10 = p1 * c1;
    const gs12 = m.k6 * sd[2] * c1;
    const gs21 = p2 * c2;
    const gs22 = m.k6 * sd[2] * c2;
    const dY1d1 = gs10 * g1[0] + gs12 * g1[2] + (2 * this.Y1) / om1;
    const dY1d2 = gs10 * g2[0] + gs12 * g2[2];
    const dY2d1 = gs21 * g1[1] + gs22 * g1[2];
    const dY2d2 = gs21 * g2[1] + gs22 * g2[2] + (2 * this.Y2) / om2;
    const k1 = this.chi1 ? evolutionSlope(m, 1, this.Yb1) : 0;
    const k2 = this.chi2 ? evolutionSlope(m, 2, this.Yb2) : 0;
    const j11 = 1 - k1 * (dY1d1 + this.bIn1 * dY2d1);
    const j12 = -k1 * (dY1d2 + this.bIn1 * dY2d2);
    const j21 = -k2 * (this.bIn2 * dY1d1 + dY2d1);
    const j22 = 1 - k2 * (this.bIn2 * dY1d2 + dY2d2);
    const jac = this.jac;
    jac[0] = j11;
    jac[1] = j12;
    jac[2] = j21;
    jac[3] = j22;
    const det = j11 * j22 - j12 * j21;
    if (!(Math.abs(det) > 1e-300) || !Number.isFinite(det)) return false;
    this.dd1 = -(j22 * this.r1 - j12 * this.r2) / det;
    this.dd2 = -(-j21 * this.r1 + j11 * this.r2) / det;
    return Number.isFinite(this.dd1) && Number.isFinite(this.dd2);
  }

  /**
   * out = dsig_D for a damage-frame right-hand side v: dsig_L = −S_L[P,P]⁻¹·[Tmᵀ·v]_P
   * (stress-controlled components do not move), dsig_D = Tm·dsig_L.
   */
  private stressSensitivity(v0: number, v1: number, v2: number, out: Float64Array): void {
    const tm = this.solver.tm;
    const k = this.solver.kPP;
    const vL = this.vL;
    vL[0] = tm[0] * v0 + tm[3] * v1 + tm[6] * v2;
    vL[1] = tm[1] * v0 + tm[4] * v1 + tm[7] * v2;
    vL[2] = tm[2] * v0 + tm[5] * v1 + tm[8] * v2;
    const s0 = -(k[0] * vL[0] + k[1] * vL[1] + k[2] * vL[2]);
    const s1 = -(k[3] * vL[0] + k[4] * vL[1] + k[5] * vL[2]);
    const s2 = -(k[6] * vL[0] + k[7] * vL[1] + k[8] * vL[2]);
    out[0] = tm[0] * s0 + tm[1] * s1 + tm[2] * s2;
    out[1] = tm[3] * s0 + tm[4] * s1 + tm[5] * s2;
    out[2] = tm[6] * s0 + tm[7] * s1 + tm[8] * s2;
  }
}

function clamp(x: number, lo: number, hi: number): number {
  return x < lo ? lo : x > hi ? hi : x;
}

/**
 * Consistent tangent of spec C.6 (strain control, load frame), row-major 3×3:
 *   Csec = S_L⁻¹ ;  Bs_j = −Csec·Tmᵀ·(dS_D/dd_j·Tm·sig_L + Hf_j·alpha_j·e_j)
 *   K = diag(chi·F')·Bb ;  Ct = Csec + Bs·(I − K·(gS·Tm·Bs + gD))⁻¹·K·gS·Tm·Csec
 * Elastic step (chi = 0): Ct = Csec. Non-symmetric in general (non-associated law).
 */
import { ElasticSolver } from "./elastic-solve";
import * as Evolution from "./evolution";
import type { Material } from "./material";
import * as StateLayout from "./state";

// Bind imported names once: CommonJS transpilation (tsx, vitest) turns every access to an
// imported binding into a getter call, which dominates a per-increment loop.
const { BROKEN, D1, D2, DP1, DP2, EPS, REGIME, TH } = StateLayout;
const { evolutionSlope, releaseRate } = Evolution;

/** Step flags the tangent needs: frozen flags Hf and loading flags chi of the converged step. */
export interface StepFlags {
  Hf1: number;
  Hf2: number;
  chi1: number;
  chi2: number;
}

export class TangentKernel {
  private readonly solver: ElasticSolver;
  private readonly eps = new Float64Array(3);
  private readonly bs = new Float64Array(6); // columns j = 0, 1 of Bs (3 each)
  private readonly gT = new Float64Array(6); // rows of gS·Tm
  private readonly rT = new Float64Array(6); // rows of gS·Tm·Csec

  constructor(private readonly m: Material) {
    this.solver = new ElasticSolver(m);
  }

  /** Writes Ct at converged state `st` with the step's flags into `out` (length 9). */
  compute(st: Float64Array, f: StepFlags, out: Float64Array): void {
    const m = this.m;
    const s = this.solver;
    const d1 = st[D1];
    const d2 = st[D2];
    s.setAngle(st[TH]);
    for (let k = 0; k < 3; k++) this.eps[k] = st[EPS + k];
    // re-solving in full strain control at the converged strain reproduces sig and gives
    // S_L of the converged regime; kPP is then Csec = S_L⁻¹
    s.solve(d1, d2, st[DP1], st[DP2], 7, this.eps, st[REGIME]);
    const csec = s.kPP;
    for (let k = 0; k < 9; k++) out[k] = csec[k];
    if (!f.chi1 && !f.chi2) return;
    const tm = s.tm;
    const sd = s.sigD;
    const o1 = s.regime & 1;
    const o2 = (s.regime >> 1) & 1;
    const om1 = 1 - d1;
    const om2 = 1 - d2;
    const c1 = 1 / (m.E1 * om1 * om1);
    const c2 = 1 / (m.E2 * om2 * om2);
    this.column(o1 * sd[0] * c1 + f.Hf1 * m.alpha, 0, m.k6 * sd[2] * c1, 0);
    this.column(0, o2 * sd[1] * c2 + f.Hf2 * m.beta, m.k6 * sd[2] * c2, 3);
    const p1 = sd[0] > 0 ? sd[0] : 0;
    const p2 = sd[1] > 0 ? sd[1] : 0;
    const Y1 = releaseRate(sd[0], sd[2], m.k6, m.E1, d1);
    const Y2 = releaseRate(sd[1], sd[2], m.k6, m.E2, d2);
    // gS·Tm rows (gS row 1 = [p1, 0, k6·s12]·c1, row 2 = [0, p2, k6·s12]·c2)
    const gT = this.gT;
    for (let k = 0; k < 3; k++) {
      gT[k] = (p1 * tm[k] + m.k6 * sd[2] * tm[6 + k]) * c1;
      gT[3 + k] = (p2 * tm[3 + k] + m.k6 * sd[2] * tm[6 + k]) * c2;
    }
    const bs = this.bs;
    const M11 = dot3(gT, 0, bs, 0) + (2 * Y1) / om1;
    const M12 = dot3(gT, 0, bs, 3);
    const M21 = dot3(gT, 3, bs, 0);
    const M22 = dot3(gT, 3, bs, 3) + (2 * Y2) / om2;
    // a broken family (spec C.7) neither evolves nor couples into the other family's Ybar
    const broken = st[BROKEN];
    const bIn1 = broken & 2 ? 0 : m.b;
    const bIn2 = broken & 1 ? 0 : m.b;
    const k1 = f.chi1 && !(broken & 1) ? evolutionSlope(m, 1, Y1 + bIn1 * Y2) : 0;
    const k2 = f.chi2 && !(broken & 2) ? evolutionSlope(m, 2, bIn2 * Y1 + Y2) : 0;
    // K = [[k1, k1·b], [k2·b, k2]];  A = I − K·M;  X = A⁻¹·K
    const K11 = k1;
    const K12 = k1 * bIn1;
    const K21 = k2 * bIn2;
    const K22 = k2;
    const A11 = 1 - (K11 * M11 + K12 * M21);
    const A12 = -(K11 * M12 + K12 * M22);
    const A21 = -(K21 * M11 + K22 * M21);
    const A22 = 1 - (K21 * M12 + K22 * M22);
    const det = A11 * A22 - A12 * A21;
    const X11 = (A22 * K11 - A12 * K21) / det;
    const X12 = (A22 * K12 - A12 * K22) / det;
    const X21 = (-A21 * K11 + A11 * K21) / det;
    const X22 = (-A21 * K12 + A11 * K22) / det;
    const rT = this.rT;
    for (let k = 0; k < 3; k++) {
      rT[k] = gT[0] * csec[k] + gT[1] * csec[3 + k] + gT[2] * csec[6 + k];
      rT[3 + k] = gT[3] * csec[k] + gT[4] * csec[3 + k] + gT[5] * csec[6 + k];
    }
    for (let r = 0; r < 3; r++) {
      // (Bs·X) row r
      const u1 = bs[r] * X11 + bs[3 + r] * X21;
      const u2 = bs[r] * X12 + bs[3 + r] * X22;
      for (let c = 0; c < 3; c++) out[3 * r + c] += u1 * rT[c] + u2 * rT[3 + c];
    }
  }

  /** Bs column at `off`: −Csec·Tmᵀ·v for the damage-frame vector v. */
  private column(v0: number, v1: number, v2: number, off: number): void {
    const tm = this.solver.tm;
    const k = this.solver.kPP;
    const a = tm[0] * v0 + tm[3] * v1 + tm[6] * v2;
    const b = tm[1] * v0 + tm[4] * v1 + tm[7] * v2;
    const c = tm[2] * v0 + tm[5] * v1 + tm[8] * v2;
    this.bs[off] = -(k[0] * a + k[1] * b + k[2] * c);
    this.bs[off + 1] = -(k[3] * a + k[4] * b + k[5] * c);
    this.bs[off + 2] = -(k[6] * a + k[7] * b + k[8] * c);
  }
}

function dot3(a: Float64Array, ia: number, b: Float64Array, ib: number): number {
  return a[ia] * b[ib] + a[ia + 1] * b[ib + 1] + a[ia + 2] * b[ib + 2];
}

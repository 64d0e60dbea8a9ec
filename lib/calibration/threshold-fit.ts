/**
 * Spec E.4 and E.5: damage and thermodynamic force per loop, then the threshold and slope of the
 * evolution law by a Theil–Sen line through the loops with d ≥ dmin.
 *   'sqrtY': d = a·sqrt(Y) + c0, sqrt(Y0) = −c0/a (a in MPa^-0.5)
 *   'linY' : d = a·Y + c0,       Y0 = −c0/a      (a in MPa^-1)
 */
import type { DamageLaw } from "@/lib/mechanics/types";
import { rSquared, theilSenLine } from "./line-fit";

export interface LoopForce {
  d: number;
  Y: number; // MPa
}

/** d_k = max(0, 1 − E_k/E0), Y_k = σmax²/(2·E0·(1 − d_k)²) for a uniaxial test. */
export function loopForce(E: number, sigMax: number, E0: number): LoopForce {
  const d = Math.max(0, 1 - E / E0);
  return { d, Y: (sigMax * sigMax) / (2 * E0 * (1 - d) * (1 - d)) };
}

export interface ThresholdFit {
  a: number;
  Y0: number; // MPa
  r2: number;
  loopsUsed: number;
  envelopeOk: boolean; // a·sqrt(Y0) < 1 ('sqrtY') or 2·a·Y0 < 1 ('linY')
}

export type ThresholdOutcome =
  { ok: true; fit: ThresholdFit } | { ok: false; reason: "insufficient loops" };

export function fitThreshold(points: LoopForce[], law: DamageLaw): ThresholdOutcome {
  if (points.length < 3) return { ok: false, reason: "insufficient loops" };
  const x = points.map((p) => (law === "sqrtY" ? Math.sqrt(p.Y) : p.Y));
  const y = points.map((p) => p.d);
  const { slope: a, intercept } = theilSenLine(x, y);
  if (!(a > 0) || !(intercept < 0)) return { ok: false, reason: "insufficient loops" };
  const root = -intercept / a;
  const Y0 = law === "sqrtY" ? root * root : root;
  return {
    ok: true,
    fit: {
      a,
      Y0,
      r2: rSquared(x, y, a, intercept),
      loopsUsed: points.length,
      envelopeOk: law === "sqrtY" ? a * Math.sqrt(Y0) < 1 : 2 * a * Y0 < 1,
    },
  };
}

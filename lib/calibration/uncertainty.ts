/**
 * How sure a refinement is (issue 14): from the Jacobian J of the scaled residuals at the
 * optimum and the residual variance s² = Σr²/(n − p), the asymptotic covariance of the least
 * squares estimate is s²·(JᵀJ)⁻¹ (Seber & Wild, Nonlinear Regression, 1989, §2.1, eq. 2.22 —
 * cited from memory). Standard errors, 95 % intervals (Student t with n − p degrees of freedom)
 * and correlations follow. Assumes independent residuals of one size: curve samples are not
 * quite that (neighbouring points share the specimen's scatter), so the intervals are a lower
 * bound of the real uncertainty; the page says so.
 */
import { Matrix, pseudoInverse } from "ml-matrix";

export interface ParamUncertainty {
  name: string;
  value: number;
  /** standard error in the parameter's unit; null when the data leave it free */
  se: number | null;
  /** 95 % interval; null with se */
  low: number | null;
  high: number | null;
}

export interface FitUncertainty {
  level: 0.95;
  /** n − p */
  degreesOfFreedom: number;
  /** residual standard deviation of the scaled residuals (fraction of each record's peak stress) */
  residualSd: number;
  params: ParamUncertainty[];
  /** correlation of the free parameters, in `params` order; null where a standard error is */
  correlation: (number | null)[][];
}

const Z_975 = 1.959963984540054;

/**
 * Two-sided 95 % quantile of Student's t with ν degrees of freedom, by the expansion of
 * Abramowitz & Stegun 26.7.5 in 1/ν around the normal quantile (error < 1e-3 for ν ≥ 5, which
 * the tests check against the tabulated values of A&S Table 26.10).
 */
export function tQuantile975(nu: number): number {
  const z = Z_975;
  const z3 = z ** 3;
  const z5 = z ** 5;
  const z7 = z ** 7;
  const z9 = z ** 9;
  return (
    z +
    (z3 + z) / (4 * nu) +
    (5 * z5 + 16 * z3 + 3 * z) / (96 * nu ** 2) +
    (3 * z7 + 19 * z5 + 17 * z3 - 15 * z) / (384 * nu ** 3) +
    (79 * z9 + 776 * z7 + 1482 * z5 - 1920 * z3 - 945 * z) / (92160 * nu ** 4)
  );
}

/**
 * Uncertainty of the free parameters. `jacobian` rows are samples, columns the scaled unknowns
 * u_j = value_j / scale_j; `residuals` are model − data in the same scaled units.
 */
export function fitUncertainty(
  jacobian: readonly (readonly number[])[],
  residuals: ArrayLike<number>,
  names: readonly string[],
  scale: readonly number[],
  values: readonly number[],
): FitUncertainty | null {
  const n = residuals.length;
  const p = names.length;
  if (p === 0 || n <= p) return null;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += residuals[i] ** 2;
  const dof = n - p;
  const s2 = ss / dof;
  const J = new Matrix(jacobian.map((row) => [...row]));
  const JtJ = J.transpose().mmul(J);
  const largest = Math.max(...names.map((_, j) => JtJ.get(j, j)));
  // A parameter the records do not move (a zero column) has no finite error: leave it out of
  // the inverse instead of letting the pseudo-inverse report a zero.
  const live = names.map((_, j) => j).filter((j) => JtJ.get(j, j) > 1e-14 * largest);
  const sub = new Matrix(live.map((a) => live.map((b) => JtJ.get(a, b))));
  const inv = live.length ? pseudoInverse(sub) : new Matrix(0, 0);
  const cov = (a: number, b: number): number | null => {
    const ia = live.indexOf(a);
    const ib = live.indexOf(b);
    return ia < 0 || ib < 0 ? null : s2 * inv.get(ia, ib) * scale[a] * scale[b];
  };
  const t = tQuantile975(dof);
  const params = names.map((name, j): ParamUncertainty => {
    const v = cov(j, j);
    const se = v !== null && v > 0 && Number.isFinite(v) ? Math.sqrt(v) : null;
    return {
      name,
      value: values[j],
      se,
      low: se === null ? null : values[j] - t * se,
      high: se === null ? null : values[j] + t * se,
    };
  });
  const correlation = names.map((_, a) =>
    names.map((__, b) => {
      const sa = params[a].se;
      const sb = params[b].se;
      const c = cov(a, b);
      if (sa === null || sb === null || c === null) return null;
      return a === b ? 1 : Math.max(-1, Math.min(1, c / (sa * sb)));
    }),
  );
  return { level: 0.95, degreesOfFreedom: dof, residualSd: Math.sqrt(s2), params, correlation };
}

/**
 * Which free parameters the data cannot separate, from the Jacobian J of the scaled residuals at
 * the solution: a column of zeros means the records do not depend on that parameter; a pair with
 * |correlation| > 0.95 in (JᵀJ)⁻¹ moves together; a near-zero eigenvalue of the normalised JᵀJ
 * names a combination the data leave free.
 */
import { EigenvalueDecomposition, Matrix, pseudoInverse } from "ml-matrix";

export interface Inseparable {
  params: string[];
  reason: string;
}

export function inseparableParams(jacobian: number[][], names: string[]): Inseparable[] {
  const J = new Matrix(jacobian); // rows: samples, columns: parameters
  const JtJ = J.transpose().mmul(J);
  const out: Inseparable[] = [];
  const live: number[] = [];
  const largest = Math.max(...names.map((_, j) => JtJ.get(j, j)));
  names.forEach((name, j) => {
    if (JtJ.get(j, j) <= 1e-14 * largest)
      out.push({ params: [name], reason: "the chosen records do not depend on it" });
    else live.push(j);
  });
  if (live.length < 2) return out;
  const sub = new Matrix(
    live.map((i) => live.map((j) => JtJ.get(i, j) / Math.sqrt(JtJ.get(i, i) * JtJ.get(j, j)))),
  );
  const cov = pseudoInverse(sub);
  for (let a = 0; a < live.length; a++) {
    for (let b = a + 1; b < live.length; b++) {
      const r = cov.get(a, b) / Math.sqrt(cov.get(a, a) * cov.get(b, b));
      if (Math.abs(r) > 0.95) {
        out.push({
          params: [names[live[a]], names[live[b]]],
          reason: `correlation ${r.toFixed(3)}`,
        });
      }
    }
  }
  const eig = new EigenvalueDecomposition(sub, { assumeSymmetric: true });
  const values = eig.realEigenvalues;
  const top = Math.max(...values);
  values.forEach((v, i) => {
    if (v < 1e-8 * top) {
      const vec = eig.eigenvectorMatrix.getColumn(i);
      const involved = live.filter((_, a) => Math.abs(vec[a]) > 0.3).map((j) => names[j]);
      if (involved.length > 1)
        out.push({ params: involved, reason: "near-singular direction of JᵀJ" });
    }
  });
  return out;
}

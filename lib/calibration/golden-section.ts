/** Golden-section search for the minimum of a unimodal function on [lo, hi] (spec E.8, E.9). */
const INV_PHI = (Math.sqrt(5) - 1) / 2;

export function goldenSection(
  f: (x: number) => number,
  lo: number,
  hi: number,
  tol = 1e-6,
  maxIter = 100,
): number {
  let a = lo;
  let b = hi;
  let c = b - INV_PHI * (b - a);
  let d = a + INV_PHI * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < maxIter && b - a > tol * Math.max(1, Math.abs(a) + Math.abs(b)); i++) {
    if (fc <= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - INV_PHI * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + INV_PHI * (b - a);
      fd = f(d);
    }
  }
  // The ends are candidates too: a bound is often the answer (b = 0 or 1).
  const mid = (a + b) / 2;
  const candidates = [lo, mid, hi];
  return candidates.reduce((best, x) => (f(x) < f(best) ? x : best), mid);
}

/**
 * Damage reached on the uniaxial 'sqrtY' branch at a given normalised peak force, spec D.4's
 * stress-control inversion: s = σ/sqrt(2E) (times sqrt(1+b), sqrt(k6·(1+b)) for D.10, D.11);
 * below the threshold d = 0, past the limit load d = d_peak.
 */
export function damageAtPeak(s: number, a: number, Y0: number): number {
  const r = Math.sqrt(Y0);
  if (s <= r) return 0;
  const c = 1 - a * r;
  const disc = c * c - 4 * a * (s - r);
  return disc <= 0 ? c / 2 : (c - Math.sqrt(disc)) / 2;
}

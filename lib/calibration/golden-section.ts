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

/**
 * Grid scan, then golden-section between the best grid point's neighbours. The error of k6 is
 * flat for small values, so a plain golden-section on the whole range can settle on the wrong end;
 * the grid (0, then log-spaced from lo + span·1e-3 to hi) finds the right valley first (issue 14).
 */
export function scannedSearch(
  f: (x: number) => number,
  lo: number,
  hi: number,
  tol = 1e-6,
  points = 24,
): number {
  const first = (hi - lo) * 1e-3;
  const grid = [lo];
  for (let i = 0; i < points; i++)
    grid.push(lo + first * ((hi - lo) / first) ** (i / (points - 1)));
  const values = grid.map(f);
  let best = 0;
  values.forEach((v, i) => {
    if (v < values[best]) best = i;
  });
  const left = grid[Math.max(0, best - 1)];
  const right = grid[Math.min(grid.length - 1, best + 1)];
  const x = goldenSection(f, left, right, tol);
  return f(x) <= values[best] ? x : grid[best];
}

/** A plain-words warning when a one-dimensional search ended on a bound of its range. */
export function boundWarning(label: string, value: number, lo: number, hi: number): string | null {
  const eps = 1e-6 * Math.max(1, Math.abs(hi - lo));
  if (Math.abs(value - lo) <= eps)
    return `${label} sits on its lower bound ${lo}: the records may not inform it`;
  if (Math.abs(value - hi) <= eps)
    return `${label} sits on its upper bound ${hi}: the records may not inform it`;
  return null;
}

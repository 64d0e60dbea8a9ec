/**
 * Fourth-moment closures in the plane (spec A.5): c4 = <cos 4θ> in the principal frame from the
 * order parameter s = <cos 2θ>.
 * - exact: c4 = s², exact for the angular central Gaussian family that flow produces from a random
 *   start (2θ is then wrapped-Cauchy with mean resultant length s) [spec A.5, derived there];
 * - hybrid: c4 = s²·(2s² − 1), linear: c4 = 0, quadratic: c4 = 2s² − 1: the 2D forms of the classic
 *   closures (Advani & Tucker 1987; hybrid after Advani & Tucker 1990) as the spec derives them.
 */

export const CLOSURES = ["exact", "hybrid", "linear", "quadratic"] as const;
export type Closure = (typeof CLOSURES)[number];

export const CLOSURE_LABELS: Record<Closure, string> = {
  exact: "Exact for flow-induced states (default)",
  hybrid: "Hybrid",
  linear: "Linear",
  quadratic: "Quadratic",
};

export function fourthMoment(s: number, closure: Closure): number {
  switch (closure) {
    case "exact":
      return s * s;
    case "hybrid":
      return s * s * (2 * s * s - 1);
    case "linear":
      return 0;
    case "quadratic":
      return 2 * s * s - 1;
  }
}

/** Which ends of the s range a closure reproduces exactly (spec A.5). */
export function closureExactAt(closure: Closure): { random: boolean; aligned: boolean } {
  return { random: closure !== "quadratic", aligned: closure !== "linear" };
}

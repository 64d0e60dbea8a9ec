/**
 * Straight lines through points: ordinary least squares with R² and standard errors, the
 * through-origin variant (spec E.6) and the Theil–Sen robust line (spec E.5).
 */
import { median } from "./robust-stats";

export interface LineFit {
  slope: number;
  intercept: number;
  r2: number;
  seSlope: number;
  seIntercept: number;
  n: number;
}

/** y = slope·x + intercept over the index range [from, to] (inclusive) of two arrays. */
export function leastSquaresLine(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  from = 0,
  to = x.length - 1,
  include: (i: number) => boolean = () => true,
): LineFit {
  let n = 0;
  let sx = 0;
  let sy = 0;
  for (let i = from; i <= to; i++) {
    if (!include(i)) continue;
    n++;
    sx += x[i];
    sy += y[i];
  }
  const mx = sx / n;
  const my = sy / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = from; i <= to; i++) {
    if (!include(i)) continue;
    const dx = x[i] - mx;
    const dy = y[i] - my;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  const sse = Math.max(0, syy - slope * sxy);
  const s2 = n > 2 ? sse / (n - 2) : 0;
  return {
    slope,
    intercept,
    r2: syy > 0 ? 1 - sse / syy : 1,
    seSlope: Math.sqrt(s2 / sxx),
    seIntercept: Math.sqrt(s2 * (1 / n + (mx * mx) / sxx)),
    n,
  };
}

/** Least squares through the origin: y = slope·x, slope = Σxy / Σx². */
export function throughOriginSlope(x: ArrayLike<number>, y: ArrayLike<number>): number {
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < x.length; i++) {
    sxy += x[i] * y[i];
    sxx += x[i] * x[i];
  }
  return sxy / sxx;
}

/** Theil–Sen: slope = median of pairwise slopes, intercept = median of y − slope·x. */
export function theilSenLine(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
): { slope: number; intercept: number } {
  const slopes: number[] = [];
  for (let i = 0; i < x.length; i++) {
    for (let j = i + 1; j < x.length; j++) {
      if (x[j] !== x[i]) slopes.push((y[j] - y[i]) / (x[j] - x[i]));
    }
  }
  const slope = median(slopes);
  const residual = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) residual[i] = y[i] - slope * x[i];
  return { slope, intercept: median(residual) };
}

/** Coefficient of determination of a given line on the points. */
export function rSquared(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  slope: number,
  intercept: number,
): number {
  let my = 0;
  for (let i = 0; i < y.length; i++) my += y[i];
  my /= y.length;
  let sse = 0;
  let sst = 0;
  for (let i = 0; i < y.length; i++) {
    sse += (y[i] - slope * x[i] - intercept) ** 2;
    sst += (y[i] - my) ** 2;
  }
  return sst > 0 ? 1 - sse / sst : 1;
}

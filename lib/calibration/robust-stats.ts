/** Small robust statistics used by cleaning and fitting (medians over plain arrays). */

export function median(values: ArrayLike<number>): number {
  const n = values.length;
  if (n === 0) return Number.NaN;
  const sorted = Float64Array.from(values).sort();
  const mid = n >> 1;
  return n % 2 === 1 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
}

/** Median absolute deviation from the median. */
export function mad(values: ArrayLike<number>): number {
  const m = median(values);
  const dev = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) dev[i] = Math.abs(values[i] - m);
  return median(dev);
}

/**
 * Sample noise of a slowly varying signal (spec E.1): differencing removes the trend, the MAD is
 * robust to the turning points, 1.4826 makes it a standard deviation for Gaussian noise and
 * sqrt(2) undoes the doubling of variance by the difference.
 */
export function noiseOfSignal(signal: ArrayLike<number>): number {
  if (signal.length < 3) return 0;
  const diff = new Float64Array(signal.length - 1);
  for (let i = 1; i < signal.length; i++) diff[i - 1] = signal[i] - signal[i - 1];
  return (1.4826 * mad(diff)) / Math.SQRT2;
}

/** Moving median over an odd window, shrinking at the ends (spec E.2: 5 points, detection only). */
export function movingMedian(signal: ArrayLike<number>, window = 5): Float64Array {
  const half = window >> 1;
  const out = new Float64Array(signal.length);
  const buf: number[] = [];
  for (let i = 0; i < signal.length; i++) {
    buf.length = 0;
    const lo = Math.max(0, i - half);
    const hi = Math.min(signal.length - 1, i + half);
    for (let j = lo; j <= hi; j++) buf.push(signal[j]);
    buf.sort((x, y) => x - y);
    const m = buf.length >> 1;
    out[i] = buf.length % 2 === 1 ? buf[m] : 0.5 * (buf[m - 1] + buf[m]);
  }
  return out;
}

/**
 * Display decimation that keeps the shape of any x–y curve: the rows are cut into buckets by
 * index and each bucket keeps its first and last row and the rows of its smallest and largest
 * x and y, in index order. Peaks, turning points and the ends survive; exports use the full data.
 */
export function decimateIndices(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  rows: number,
  buckets: number,
): Int32Array {
  if (rows <= buckets * 6) return Int32Array.from({ length: rows }, (_, i) => i);
  const out = new Int32Array(buckets * 6);
  let n = 0;
  const picks = new Int32Array(6);
  for (let b = 0; b < buckets; b++) {
    const lo = Math.floor((b * rows) / buckets);
    const hi = Math.floor(((b + 1) * rows) / buckets) - 1;
    let xMin = lo,
      xMax = lo,
      yMin = lo,
      yMax = lo;
    for (let i = lo + 1; i <= hi; i++) {
      if (x[i] < x[xMin]) xMin = i;
      if (x[i] > x[xMax]) xMax = i;
      if (y[i] < y[yMin]) yMin = i;
      if (y[i] > y[yMax]) yMax = i;
    }
    picks.set([lo, xMin, xMax, yMin, yMax, hi]);
    picks.sort();
    for (let k = 0; k < 6; k++) if (k === 0 || picks[k] !== picks[k - 1]) out[n++] = picks[k];
  }
  return out.slice(0, n);
}

/** Values of `col` at `indices`, as a plain array for the chart. */
export function pick(col: ArrayLike<number>, indices: Int32Array): number[] {
  const out = new Array<number>(indices.length);
  for (let k = 0; k < indices.length; k++) out[k] = col[indices[k]];
  return out;
}

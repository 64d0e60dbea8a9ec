/**
 * Fewer samples for the least-squares loop. Replaying a strain history is exact at any sample as
 * long as every monotonic stretch is kept whole (the law remembers only the maximum force), so
 * all turning points of the strain stay and the rest is thinned evenly. The final residuals are
 * always computed on the full record.
 */
export function decimationIndices(strain: ArrayLike<number>, maxPoints: number): Int32Array {
  const n = strain.length;
  if (n <= maxPoints) return Int32Array.from({ length: n }, (_, i) => i);
  const keep = new Uint8Array(n);
  keep[0] = 1;
  keep[n - 1] = 1;
  let turning = 2;
  for (let i = 1; i < n - 1; i++) {
    const before = strain[i] - strain[i - 1];
    const after = strain[i + 1] - strain[i];
    if (before * after < 0 || (before !== 0 && after === 0)) {
      keep[i] = 1;
      turning++;
    }
  }
  const stride = Math.max(1, Math.ceil(n / Math.max(1, maxPoints - turning)));
  for (let i = 0; i < n; i += stride) keep[i] = 1;
  const out: number[] = [];
  for (let i = 0; i < n; i++) if (keep[i]) out.push(i);
  return Int32Array.from(out);
}

import { describe, expect, it } from "vitest";
import { decimateIndices, pick } from "@/lib/client/loading-desk/decimate";

describe("display decimation", () => {
  it("keeps every row of a short curve", () => {
    expect(Array.from(decimateIndices([1, 2, 3], [1, 2, 3], 3, 100))).toEqual([0, 1, 2]);
  });

  it("bounds the point count, keeps the ends and the extremes, in index order", () => {
    const n = 100_000;
    const x = new Float64Array(n);
    const y = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      x[i] = Math.sin(i / 997);
      y[i] = Math.cos(i / 331) + (i === 54_321 ? 10 : 0);
    }
    const idx = decimateIndices(x, y, n, 300);
    expect(idx.length).toBeLessThanOrEqual(1800);
    expect(idx[0]).toBe(0);
    expect(idx[idx.length - 1]).toBe(n - 1);
    expect(Array.from(idx)).toContain(54_321);
    for (let k = 1; k < idx.length; k++) expect(idx[k]).toBeGreaterThan(idx[k - 1]);
    const ys = pick(y, idx);
    expect(Math.max(...ys)).toBe(Math.max(...y));
    expect(Math.min(...pick(x, idx))).toBe(Math.min(...x));
  });

  it("only reads the filled rows", () => {
    const x = new Float64Array(1000).fill(5);
    x[10] = -1;
    const idx = decimateIndices(x, x, 9, 1);
    expect(Math.max(...idx)).toBeLessThan(9);
  });
});

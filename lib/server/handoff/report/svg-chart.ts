import "server-only";

/**
 * A small static line chart for printed reports: series → SVG path data in a fixed box, with
 * rounded axis ticks. Print needs no script, so these are drawn on the server.
 */
export interface Series {
  name: string;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
}

export interface ChartGeometry {
  width: number;
  height: number;
  paths: { name: string; d: string }[];
  xTicks: { at: number; label: string }[];
  yTicks: { at: number; label: string }[];
  /** Pixel positions of x = 0 and y = 0 when inside the box. */
  zero: { x: number | null; y: number | null };
}

const PAD = { left: 56, right: 12, top: 10, bottom: 32 };

function niceStep(span: number, count: number): number {
  const raw = span / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const n = raw / mag;
  return (n <= 1 ? 1 : n <= 2 ? 2 : n <= 5 ? 5 : 10) * mag;
}

function range(values: ArrayLike<number>[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values)
    for (let i = 0; i < v.length; i++)
      if (Number.isFinite(v[i])) {
        lo = Math.min(lo, v[i]);
        hi = Math.max(hi, v[i]);
      }
  if (!Number.isFinite(lo)) return [0, 1];
  return lo === hi ? [lo - 1, hi + 1] : [lo, hi];
}

function ticks(lo: number, hi: number, toPx: (v: number) => number) {
  const step = niceStep(hi - lo, 5);
  const out: { at: number; label: string }[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) {
    out.push({ at: toPx(v), label: Number(v.toPrecision(3)).toString() });
  }
  return out;
}

/** At most `maxPoints` per series: a print does not need every increment. */
export function chartGeometry(
  series: Series[],
  width = 480,
  height = 260,
  maxPoints = 1500,
): ChartGeometry {
  const [x0, x1] = range(series.map((s) => s.x));
  const [y0, y1] = range(series.map((s) => s.y));
  const w = width - PAD.left - PAD.right;
  const h = height - PAD.top - PAD.bottom;
  const px = (v: number) => PAD.left + ((v - x0) / (x1 - x0)) * w;
  const py = (v: number) => PAD.top + h - ((v - y0) / (y1 - y0)) * h;
  const paths = series.map((s) => {
    const stride = Math.max(1, Math.ceil(s.x.length / maxPoints));
    const parts: string[] = [];
    for (let i = 0; i < s.x.length; i += stride) {
      parts.push(
        `${parts.length === 0 ? "M" : "L"}${px(s.x[i]).toFixed(1)},${py(s.y[i]).toFixed(1)}`,
      );
    }
    return { name: s.name, d: parts.join(" ") };
  });
  return {
    width,
    height,
    paths,
    xTicks: ticks(x0, x1, px),
    yTicks: ticks(y0, y1, py),
    zero: { x: x0 <= 0 && x1 >= 0 ? px(0) : null, y: y0 <= 0 && y1 >= 0 ? py(0) : null },
  };
}

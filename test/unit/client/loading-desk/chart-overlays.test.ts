import { describe, expect, it } from "vitest";
import { FIXED_CHARTS, stressStrainDef } from "@/lib/client/loading-desk/chart-defs";
import {
  type ChartOverlay,
  OVERLAY_COLORS,
  overlayTraces,
} from "@/lib/client/loading-desk/chart-overlays";
import { DISPLAY_BUCKETS } from "@/lib/client/loading-desk/chart-traces";
import { SET_COLORS } from "@/lib/client/loading-desk/set-colors";

function overlay(id: string, x: ChartOverlay["x"], y: ChartOverlay["y"], n: number): ChartOverlay {
  const xs = Array.from({ length: n }, (_, i) => i * 1e-5);
  // one sharp peak in the middle, which thinning must keep
  const ys = xs.map((_, i) => (i === Math.floor(n / 2) ? 500 : i % 7));
  return { id, label: `coupon ${id}`, chart: "stress-strain", x, y, xs, ys };
}

describe("chart overlays", () => {
  it("draws only the records whose pair is the chart's, dotted, grey and labelled test: name", () => {
    const list = [
      overlay("a", "eps11", "sig11", 40),
      overlay("b", "eps22", "sig22", 40),
      overlay("c", "eps11", "sig11", 30),
    ];
    const traces = overlayTraces(stressStrainDef("eps11", "sig11"), list);
    expect(traces.map((t) => t.name)).toEqual(["test: coupon a", "test: coupon c"]);
    for (const t of traces) {
      expect(t.line?.dash).toBe("dot");
      expect(OVERLAY_COLORS).toContain(t.line?.color);
      expect(SET_COLORS as readonly string[]).not.toContain(t.line?.color);
      expect(t.showlegend).toBe(true);
      expect(t.hovertemplate).toContain("σ11 (MPa)");
    }
    // two records on one chart are told apart by shade
    expect(traces[0].line?.color).not.toBe(traces[1].line?.color);
    expect(traces[1].x).toEqual(list[2].xs);

    const shear = overlayTraces(stressStrainDef("gam12", "sig12"), list);
    expect(shear).toEqual([]);
    const other = overlayTraces(stressStrainDef("eps22", "sig22"), list);
    expect(other.map((t) => t.meta.set)).toEqual(["test:b"]);
  });

  it("never lands on the fixed charts", () => {
    const list = [overlay("a", "eps11", "sig11", 10)];
    for (const def of FIXED_CHARTS) expect(overlayTraces(def, list)).toEqual([]);
  });

  it("thins a long record for display but keeps its ends and its peak", () => {
    const long = overlay("big", "eps11", "sig11", 200_000);
    const [t] = overlayTraces(stressStrainDef("eps11", "sig11"), [long]);
    expect(t.x.length).toBeLessThanOrEqual(DISPLAY_BUCKETS * 6);
    expect(t.x.length).toBe(t.y.length);
    expect(t.x[0]).toBe(long.xs[0]);
    expect(t.x.at(-1)).toBe(long.xs.at(-1));
    expect(Math.max(...t.y)).toBe(500);
  });

  it("draws only as many points as both columns have", () => {
    const ragged = { ...overlay("r", "eps11", "sig11", 10), ys: [1, 2, 3] };
    const [t] = overlayTraces(stressStrainDef("eps11", "sig11"), [ragged]);
    expect(t.x).toHaveLength(3);
    expect(t.y).toEqual([1, 2, 3]);
  });
});

/**
 * Measured curves laid over a loading desk chart (e.g. a team's test record on the stress–strain
 * chart). They are reference lines only: dotted, neutral, never marked, never moving the cursor.
 */
import type { ChartDef, StrainComponent, StressComponent } from "./chart-defs";
import { type ChartTrace, DISPLAY_BUCKETS } from "./chart-traces";
import { decimateIndices, pick } from "./decimate";

/** One measured curve for a chart, strain mm/mm against stress MPa like the computed ones. */
export interface ChartOverlay {
  /** Stable key (e.g. the record id): legend group and trace identity. */
  id: string;
  label: string;
  chart: "stress-strain";
  x: StrainComponent;
  y: StressComponent;
  xs: number[];
  ys: number[];
}

// Greys, not the set palette: a measured curve must never read as one of the parameter sets.
export const OVERLAY_COLORS = ["#4b5563", "#9ca3af", "#6b7280", "#374151"] as const;

/**
 * Traces of the overlays whose axes are the chart's: the chart's own key and first series' x and
 * y columns. Long records are thinned like the computed curves (turning points kept).
 */
export function overlayTraces(def: ChartDef, overlays: readonly ChartOverlay[]): ChartTrace[] {
  const axes = def.series[0];
  if (!axes) return [];
  return overlays
    .filter((o) => o.chart === def.key && o.x === axes.x && o.y === axes.y)
    .map((o, k) => {
      const rows = Math.min(o.xs.length, o.ys.length);
      const idx = decimateIndices(o.xs, o.ys, rows, DISPLAY_BUCKETS);
      const name = `test: ${o.label}`;
      return {
        type: "scatter",
        mode: "lines",
        x: pick(o.xs, idx),
        y: pick(o.ys, idx),
        name,
        legendgroup: `test:${o.id}`,
        showlegend: true,
        meta: { set: `test:${o.id}`, series: "overlay" },
        line: { color: OVERLAY_COLORS[k % OVERLAY_COLORS.length], dash: "dot", width: 1.6 },
        hovertemplate: `${def.xTitle}: %{x:.5g}<br>${def.yTitle}: %{y:.5g}<extra>${name}</extra>`,
      };
    });
}

"use client";

import { Plot } from "@/components/charts/plot";

export interface CurveTrace {
  name: string;
  x: number[];
  y: number[];
  dash?: boolean;
  markers?: boolean;
}

/** Stress against strain, one or more curves (measured solid, computed dashed). */
export function CurveChart({
  traces,
  xTitle = "strain (mm/mm)",
  yTitle = "stress (MPa)",
  height = 320,
  testId,
}: {
  traces: CurveTrace[];
  xTitle?: string;
  yTitle?: string;
  height?: number;
  testId?: string;
}) {
  return (
    <div data-testid={testId} style={{ height }}>
      <Plot
        data={traces.map((t) => ({
          type: "scatter",
          mode: t.markers ? "markers" : "lines",
          name: t.name,
          x: t.x,
          y: t.y,
          line: t.dash ? { dash: "dash", width: 2 } : { width: 1.5 },
        }))}
        layout={{
          autosize: true,
          // The legend sits above the plot: beneath it, it ran into the x axis title.
          margin: { l: 60, r: 10, t: 30, b: 45 },
          xaxis: { title: { text: xTitle } },
          yaxis: { title: { text: yTitle } },
          legend: { orientation: "h", x: 0, xanchor: "left", y: 1, yanchor: "bottom" },
          paper_bgcolor: "rgba(0,0,0,0)",
        }}
        config={{ displaylogo: false, responsive: true }}
        style={{ width: "100%", height: "100%" }}
        useResizeHandler
      />
    </div>
  );
}

import type { ChartDef } from "@/lib/client/loading-desk/chart-defs";

const FONT = {
  family: "IBM Plex Sans Variable, system-ui, sans-serif",
  size: 11,
  color: "#1f2a30",
};
const AXIS = {
  gridcolor: "#ece5d6",
  zerolinecolor: "#b9ae98",
  linecolor: "#d9cfbb",
  automargin: true,
  exponentformat: "power" as const,
};

/** Our own plain chart look: white plot on the glaze page, legend beneath. */
export function chartLayout(def: ChartDef, empty = false) {
  return {
    annotations: empty
      ? [
          {
            text: "no results to show yet",
            showarrow: false,
            xref: "paper" as const,
            yref: "paper" as const,
            x: 0.5,
            y: 0.5,
            font: { ...FONT, size: 12, color: "#6b7a82" },
          },
        ]
      : [],
    font: FONT,
    margin: { l: 56, r: 12, t: 8, b: 40 },
    paper_bgcolor: "rgba(0,0,0,0)",
    plot_bgcolor: "#ffffff",
    hovermode: "closest" as const,
    hoverlabel: { font: { ...FONT, color: "#ffffff" } },
    showlegend: true,
    legend: { orientation: "h" as const, y: -0.22, font: { ...FONT, size: 10 } },
    xaxis: { ...AXIS, title: { text: def.xTitle, standoff: 4 }, visible: !empty },
    yaxis: { ...AXIS, title: { text: def.yTitle, standoff: 4 }, visible: !empty },
    // keep zoom while the data grows; a new horizontal axis starts at the full extent
    uirevision: `${def.key}:${def.xAxis}`,
  };
}

export const CHART_CONFIG = {
  displayModeBar: false,
  responsive: true,
  scrollZoom: false,
  doubleClick: "reset" as const,
};

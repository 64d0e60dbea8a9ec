"use client";
/**
 * The one place that loads Plotly (react-plotly.js/factory + plotly.js-dist-min, client only).
 * Every chart of the product draws through <Plot>; images are saved with `saveChartImage`.
 */
import dynamic from "next/dynamic";
import type { PlotParams } from "react-plotly.js/factory";
import { STAMP_TOP } from "@/lib/client/loading-desk/image-stamp";

const loadPlotly = () => import("plotly.js-dist-min").then((m) => m.default);

const PlotlyComponent = dynamic(
  async () => {
    const [Plotly, factory] = await Promise.all([loadPlotly(), import("react-plotly.js/factory")]);
    return factory.default(Plotly);
  },
  {
    ssr: false,
    loading: () => <div className="h-full w-full animate-pulse rounded bg-glaze-deep/60" />,
  },
);

export type PlotProps = PlotParams;

export function Plot(props: PlotProps) {
  return <PlotlyComponent {...props} />;
}

/**
 * Downloads a drawn chart as PNG (2× pixels) or SVG at full data resolution of what is drawn.
 * `layoutFor` may change the saved image's layout (the stamp) without touching the chart on screen.
 */
export async function saveChartImage(
  graphDiv: HTMLElement,
  format: "png" | "svg",
  filename: string,
  layoutFor?: (layout: Record<string, unknown>) => Record<string, unknown>,
): Promise<void> {
  const Plotly = await loadPlotly();
  const drawn = graphDiv as HTMLElement & { data: unknown[]; layout: Record<string, unknown> };
  const figure = { data: drawn.data, layout: layoutFor ? layoutFor(drawn.layout) : drawn.layout };
  const url = await Plotly.toImage(
    figure as never,
    {
      format,
      width: graphDiv.clientWidth || 800,
      // the stamp's lines get their own room above the plot (STAMP_TOP of image-stamp.ts)
      height: (graphDiv.clientHeight || 500) + (layoutFor ? STAMP_TOP : 0),
      scale: format === "png" ? 2 : 1,
    } as Parameters<typeof Plotly.toImage>[1],
  );
  const link = document.createElement("a");
  link.href = url;
  link.download = `${filename}.${format}`;
  link.click();
}

/** Back to the full extent of the data after a drag-zoom (what double-click does). */
export async function resetChartZoom(graphDiv: HTMLElement): Promise<void> {
  const Plotly = await loadPlotly();
  // dotted attribute names are Plotly's relayout form; its types know only the nested one
  const fit = { "xaxis.autorange": true, "yaxis.autorange": true } as Record<string, unknown>;
  await Plotly.relayout(graphDiv, fit as Parameters<typeof Plotly.relayout>[1]);
}

/** Redraws a chart at its box's new size (enlarged or back in the grid). */
export async function fitChartToBox(graphDiv: HTMLElement): Promise<void> {
  const Plotly = await loadPlotly();
  await Plotly.Plots.resize(graphDiv);
}

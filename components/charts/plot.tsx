"use client";
/**
 * The one place that loads Plotly (react-plotly.js/factory + plotly.js-dist-min, client only).
 * Every chart of the product draws through <Plot>; images are saved with `saveChartImage`.
 */
import dynamic from "next/dynamic";
import type { PlotParams } from "react-plotly.js/factory";

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

/** Downloads a drawn chart as PNG (2× pixels) or SVG at full data resolution of what is drawn. */
export async function saveChartImage(
  graphDiv: HTMLElement,
  format: "png" | "svg",
  filename: string,
): Promise<void> {
  const Plotly = await loadPlotly();
  await Plotly.downloadImage(graphDiv, {
    format,
    filename,
    width: graphDiv.clientWidth || 800,
    height: graphDiv.clientHeight || 500,
    scale: format === "png" ? 2 : 1,
  } as Parameters<typeof Plotly.downloadImage>[1]);
}

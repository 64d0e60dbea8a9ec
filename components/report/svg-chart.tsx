import { SET_COLORS } from "@/lib/client/loading-desk/set-colors";
import {
  type LineDash,
  setLineStyle,
  svgDashArray,
} from "@/lib/client/loading-desk/set-line-style";
import type { ChartGeometry } from "@/lib/server/handoff/report/svg-chart";

// The second and third curve of a set (d2, …) as on screen.
const SERIES_DASHES: LineDash[] = ["solid", "dash", "dot"];
// Screen line widths to the chart's units: 480 units print 160 mm wide.
const PRINT_WIDTH = 0.55;

/**
 * A static chart for print: axes, ticks, one path per series, a legend. Series come in groups
 * of `seriesPerSet` per parameter set, in the file's order: each set keeps the colour it has on
 * screen and its line style (set-line-style: its own dash, or with several curves per set a
 * narrower line per set while d2, … are dashed and dotted).
 */
export function SvgChart({
  title,
  chart,
  xTitle,
  yTitle,
  seriesPerSet = 1,
}: {
  title: string;
  chart: ChartGeometry;
  xTitle: string;
  yTitle: string;
  seriesPerSet?: number;
}) {
  const bottom = chart.height - 32;
  const colour = (i: number) => SET_COLORS[Math.floor(i / seriesPerSet) % SET_COLORS.length];
  const line = (i: number) => {
    const style = setLineStyle(
      Math.floor(i / seriesPerSet),
      SERIES_DASHES[(i % seriesPerSet) % SERIES_DASHES.length],
      seriesPerSet,
    );
    const width = style.width * PRINT_WIDTH;
    return { width, dash: svgDashArray(style.dash, width) };
  };
  return (
    // In print one chart per row, 160 mm wide: the 9-unit tick labels then print at 8.5 pt.
    <figure className="break-inside-avoid print:mx-auto print:w-[160mm]">
      <figcaption className="text-sm font-semibold">{title}</figcaption>
      <svg
        viewBox={`0 0 ${chart.width} ${chart.height + 14}`}
        className="w-full"
        role="img"
        aria-label={title}
      >
        <line x1={56} x2={chart.width - 12} y1={bottom} y2={bottom} stroke="#6b7a82" />
        <line x1={56} x2={56} y1={10} y2={bottom} stroke="#6b7a82" />
        {chart.zero.y !== null ? (
          <line
            x1={56}
            x2={chart.width - 12}
            y1={chart.zero.y}
            y2={chart.zero.y}
            stroke="#d9cfbb"
          />
        ) : null}
        {chart.xTicks.map((t) => (
          <text
            key={`x${t.at}`}
            x={t.at}
            y={bottom + 14}
            fontSize={9}
            textAnchor="middle"
            fill="#3b4a52"
          >
            {t.label}
          </text>
        ))}
        {chart.yTicks.map((t) => (
          <text key={`y${t.at}`} x={50} y={t.at + 3} fontSize={9} textAnchor="end" fill="#3b4a52">
            {t.label}
          </text>
        ))}
        <text x={(chart.width + 56) / 2} y={bottom + 28} fontSize={10} textAnchor="middle">
          {xTitle}
        </text>
        <text
          x={10}
          y={chart.height / 2}
          fontSize={10}
          textAnchor="middle"
          transform={`rotate(-90 10 ${chart.height / 2})`}
        >
          {yTitle}
        </text>
        {chart.paths.map((p, i) => (
          <path
            key={p.name}
            d={p.d}
            fill="none"
            stroke={colour(i)}
            strokeDasharray={line(i).dash}
            strokeWidth={line(i).width}
          />
        ))}
      </svg>
      <p className="text-xs text-ink-soft">
        {chart.paths.map((p, i) => (
          <span key={p.name} className="mr-3 inline-flex items-center gap-1">
            <svg width="22" height="8" aria-hidden="true">
              <line
                x1="1"
                x2="21"
                y1="4"
                y2="4"
                stroke={colour(i)}
                strokeWidth={Math.max(1.2, line(i).width)}
                strokeDasharray={line(i).dash}
              />
            </svg>
            {p.name}
          </span>
        ))}
      </p>
    </figure>
  );
}

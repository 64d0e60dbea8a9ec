import type { ChartGeometry } from "@/lib/server/handoff/report/svg-chart";

const COLOURS = ["#2f7a74", "#b4532a", "#1f2a30", "#8c6d1f", "#5a4a8c", "#3b7a2f"];

/** A static chart for print: axes, ticks, one path per series, a legend. */
export function SvgChart({
  title,
  chart,
  xTitle,
  yTitle,
}: {
  title: string;
  chart: ChartGeometry;
  xTitle: string;
  yTitle: string;
}) {
  const bottom = chart.height - 32;
  return (
    <figure className="break-inside-avoid">
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
            stroke={COLOURS[i % COLOURS.length]}
            strokeWidth={1.4}
          />
        ))}
      </svg>
      <p className="text-xs text-ink-soft">
        {chart.paths.map((p, i) => (
          <span key={p.name} className="mr-3">
            <span style={{ color: COLOURS[i % COLOURS.length] }}>■</span> {p.name}
          </span>
        ))}
      </p>
    </figure>
  );
}

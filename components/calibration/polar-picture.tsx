/**
 * A small polar plot (SVG) of one or more curves r(θ), θ in degrees counter-clockwise from x.
 * Each curve is scaled to the largest r over all curves so roses stay comparable.
 */
import type { PolarPoint } from "@/lib/calibration/micromechanics/roses";

export interface PolarCurve {
  label: string;
  points: PolarPoint[];
  className: string; // stroke colour class
  dashed?: boolean;
}

export function PolarPicture({
  curves,
  title,
  size = 180,
  testId,
}: {
  curves: PolarCurve[];
  title: string;
  size?: number;
  testId?: string;
}) {
  const half = size / 2;
  const rMax = Math.max(1e-300, ...curves.flatMap((c) => c.points.map((p) => p.r)));
  const scale = (half - 8) / rMax;
  const path = (points: PolarPoint[]) =>
    points
      .map((p, k) => {
        const t = (p.theta * Math.PI) / 180;
        const x = half + p.r * scale * Math.cos(t);
        const y = half - p.r * scale * Math.sin(t);
        return `${k === 0 ? "M" : "L"}${x.toFixed(2)},${y.toFixed(2)}`;
      })
      .join(" ") + " Z";
  return (
    <figure className="text-xs" data-testid={testId}>
      <svg
        width={size}
        height={size}
        viewBox={`0 0 ${size} ${size}`}
        role="img"
        aria-label={title}
        className="rounded border border-glaze-line bg-white"
      >
        <title>{title}</title>
        <line x1={4} y1={half} x2={size - 4} y2={half} className="stroke-glaze-line" />
        <line x1={half} y1={4} x2={half} y2={size - 4} className="stroke-glaze-line" />
        <circle cx={half} cy={half} r={half - 8} fill="none" className="stroke-glaze-line" />
        {curves.map((c) => (
          <path
            key={c.label}
            d={path(c.points)}
            fill="none"
            strokeWidth={1.5}
            strokeDasharray={c.dashed ? "4 3" : undefined}
            className={c.className}
          >
            <title>{c.label}</title>
          </path>
        ))}
      </svg>
      <figcaption className="mt-1 text-ink-soft">
        {title}
        {curves.length > 1 ? (
          <span className="block">
            {curves.map((c) => (
              <span key={c.label} className="mr-2 inline-flex items-center gap-1">
                <svg width="14" height="4" aria-hidden="true">
                  <line
                    x1="0"
                    y1="2"
                    x2="14"
                    y2="2"
                    strokeWidth={2}
                    strokeDasharray={c.dashed ? "4 3" : undefined}
                    className={c.className}
                  />
                </svg>
                {c.label}
              </span>
            ))}
          </span>
        ) : null}
      </figcaption>
    </figure>
  );
}

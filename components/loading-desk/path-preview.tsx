import type { Leg } from "@/lib/mechanics/types";
import { componentName } from "@/lib/scenario/path-text/components";
import { previewStrips } from "@/lib/client/loading-desk/path-preview";

export interface PathPreviewProps {
  legs: Leg[];
}

const COLOR = { strain: "#2f7a74", stress: "#b4532a" } as const;
const H = 26;

/** Prescribed values of the three components against increment (strain green, stress terracotta). */
export function PathPreview({ legs }: PathPreviewProps) {
  const { strips, total } = previewStrips(legs);
  if (total === 0) return null;
  return (
    <figure aria-label="Preview of the prescribed path" className="space-y-0.5">
      {strips.map((strip) => {
        const y = (v: number, control: "strain" | "stress") => {
          const m = strip.max[control] || 1;
          return H / 2 - (v / m) * (H / 2 - 2);
        };
        return (
          <div key={strip.component} className="flex items-center gap-2">
            <span className="w-8 font-mono text-[11px] text-ink-faint">
              {["11", "22", "12"][strip.component]}
            </span>
            <svg
              viewBox={`0 0 ${total} ${H}`}
              preserveAspectRatio="none"
              className="h-[26px] flex-1 rounded bg-white"
              role="img"
              aria-label={`direction ${["11", "22", "12"][strip.component]}: ${strip.segments.map((s) => `${componentName(strip.component, s.control)}→${s.end}`).join(", ")}`}
            >
              <line
                x1={0}
                x2={total}
                y1={H / 2}
                y2={H / 2}
                stroke="#d9cfbb"
                strokeWidth={1}
                vectorEffect="non-scaling-stroke"
              />
              {strip.segments.map((s, k) => (
                <line
                  key={k}
                  x1={s.from}
                  x2={s.to}
                  y1={s.start === null ? y(s.end, s.control) : y(s.start, s.control)}
                  y2={y(s.end, s.control)}
                  stroke={COLOR[s.control]}
                  strokeWidth={1.6}
                  strokeDasharray={s.start === null ? "3 2" : undefined}
                  vectorEffect="non-scaling-stroke"
                />
              ))}
            </svg>
          </div>
        );
      })}
      <figcaption className="flex gap-3 pl-10 text-[11px] text-ink-faint">
        <span>
          <span style={{ color: COLOR.strain }}>━</span> strain prescribed
        </span>
        <span>
          <span style={{ color: COLOR.stress }}>━</span> stress prescribed
        </span>
        <span>┄ starts where the run arrives</span>
        <span className="ml-auto">{total.toLocaleString("en")} increments</span>
      </figcaption>
    </figure>
  );
}

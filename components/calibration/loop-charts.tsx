"use client";

import { CurveChart } from "@/components/records/curve-chart";
import type { LoopRow } from "@/lib/calibration/types";
import type { MaterialParams } from "@/lib/mechanics/types";
import { SQRT_Y_UNIT } from "@/lib/scenario/parameter-fields";

/** d against √Y (or Y) with the fitted threshold line, and residual strain against d. */
export function LoopCharts({ loops, params }: { loops: LoopRow[]; params: MaterialParams }) {
  const sqrt = params.law === "sqrtY";
  const xOf = (Y: number) => (sqrt ? Math.sqrt(Y) : Y);
  const x0 = xOf(params.Y0_1);
  const xs = loops.map((l) => xOf(l.Y));
  const xEnd = Math.max(x0, ...xs) * 1.05;
  const dMax = Math.max(0, ...loops.map((l) => l.d)) * 1.1 || 0.1;
  const points = (pick: (l: LoopRow) => number) => ({
    x: loops.map((l) => l.d),
    y: loops.map(pick),
  });
  return (
    <div className="grid gap-4 md:grid-cols-2">
      <div data-testid="threshold-chart">
        <CurveChart
          height={260}
          xTitle={sqrt ? `√Y (${SQRT_Y_UNIT})` : "Y (MPa)"}
          yTitle="damage d"
          traces={[
            { name: "loops", x: xs, y: loops.map((l) => l.d), markers: true },
            { name: "fitted line", x: [x0, xEnd], y: [0, params.a1 * (xEnd - x0)], dash: true },
          ]}
        />
      </div>
      <div data-testid="residual-chart">
        <CurveChart
          height={260}
          xTitle="damage d"
          yTitle="residual strain (mm/mm)"
          traces={[
            { name: "loops", ...points((l) => l.epsR), markers: true },
            { name: "alpha·d", x: [0, dMax], y: [0, params.alpha * dMax], dash: true },
          ]}
        />
      </div>
    </div>
  );
}

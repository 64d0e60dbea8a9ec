"use client";

import { CurveChart, type CurveTrace } from "@/components/records/curve-chart";
import type { OverlayCurve } from "@/lib/server/records/fits";

/** Each test curve with the law's replay of its strain history drawn over it. */
export function FitOverlay({ curves }: { curves: OverlayCurve[] }) {
  const traces: CurveTrace[] = curves.flatMap((c) => [
    { name: `${c.name} (test)`, ...c.measured },
    ...(c.computed ? [{ name: `${c.name} (computed)`, ...c.computed, dash: true }] : []),
  ]);
  return <CurveChart testId="fit-overlay" traces={traces} height={360} />;
}

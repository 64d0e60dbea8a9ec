"use client";

import { useEffect, useMemo, useState } from "react";
import { ResultChart } from "@/components/charts/result-chart";
import {
  FIXED_CHARTS,
  STRAIN_LABEL,
  STRESS_LABEL,
  type StrainComponent,
  type StressComponent,
  stressStrainDef,
} from "@/lib/client/loading-desk/chart-defs";
import type { ChartOverlay } from "@/lib/client/loading-desk/chart-overlays";
import { DEFAULT_DESK_CHARTS, type DeskCharts } from "@/lib/scenario/desk-extras";
import { withXAxis, type XAxisChoice } from "@/lib/client/loading-desk/chart-x-axis";
import {
  setIncrementCursor,
  useIncrementCursor,
} from "@/lib/client/loading-desk/increment-cursor-store";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";
import { IncrementCursor } from "./increment-cursor";
import { XAxisSelect } from "./x-axis-select";

export interface ChartGridProps {
  store: ResultsStore;
  entries: SetEntry[];
  scenarioName: string;
  /** "revision 4" when a saved revision is open; stamped on saved images. */
  revision?: string | null;
  totalIncrements: number;
  overlays?: readonly ChartOverlay[];
  /** The chart choices kept with the scenario; without them the grid keeps its own. */
  choices?: DeskCharts;
  onChoices?: (choices: DeskCharts) => void;
}

const pickCls = "rounded border border-glaze-line bg-white px-1 py-0.5 text-xs";

/** The live charts, every visible set overlaid, one increment cursor shared by all. */
export function ChartGrid({
  store,
  entries,
  scenarioName,
  revision = null,
  totalIncrements,
  overlays,
  choices,
  onChoices,
}: ChartGridProps) {
  const [own, setOwn] = useState<DeskCharts>(DEFAULT_DESK_CHARTS);
  const current = choices ?? own;
  const choose = onChoices ?? setOwn;
  const { strain: x, stress: y } = current.stressStrain;
  // Each fixed chart's horizontal axis by chart key; absent = the chart's default.
  const xOf: Record<string, XAxisChoice> = current.horizontal;
  const setX = (strain: StrainComponent) =>
    choose({ ...current, stressStrain: { ...current.stressStrain, strain } });
  const setY = (stress: StressComponent) =>
    choose({ ...current, stressStrain: { ...current.stressStrain, stress } });
  const setXOf = (key: string, axis: XAxisChoice) =>
    choose({ ...current, horizontal: { ...current.horizontal, [key]: axis } });
  const [cursor, setCursor] = useIncrementCursor();
  // The cursor belongs to this desk: leaving the page must not carry it to the next scenario.
  useEffect(() => () => setIncrementCursor(null), []);
  const ssDef = useMemo(() => stressStrainDef(x, y), [x, y]);
  // New chart definitions only when an axis changes: each chart rebuilds its traces on a new def.
  const fixedDefs = useMemo(
    () => FIXED_CHARTS.map((base) => withXAxis(base, xOf[base.key] ?? base.xAxis)),
    [xOf],
  );
  const common = { store, entries, cursor, onCursor: setCursor, scenarioName, revision };
  const pickers = (
    <span className="flex items-center gap-1 text-xs">
      <select
        aria-label="Stress component (vertical axis)"
        value={y}
        onChange={(e) => setY(e.target.value as StressComponent)}
        className={pickCls}
      >
        {Object.entries(STRESS_LABEL).map(([k, v]) => (
          <option key={k} value={k}>
            {v}
          </option>
        ))}
      </select>
      <span className="text-ink-faint">against</span>
      <select
        aria-label="Strain component (horizontal axis)"
        value={x}
        onChange={(e) => setX(e.target.value as StrainComponent)}
        className={pickCls}
      >
        {Object.entries(STRAIN_LABEL).map(([k, v]) => (
          <option key={k} value={k}>
            {v}
          </option>
        ))}
      </select>
    </span>
  );
  return (
    <div className="space-y-3">
      <IncrementCursor value={cursor} max={totalIncrements} onChange={setCursor} />
      <div className="grid grid-cols-1 gap-3 xl:grid-cols-2">
        <ResultChart def={ssDef} controls={pickers} overlays={overlays} {...common} />
        {fixedDefs.map((def, k) => (
          <ResultChart
            key={def.key}
            def={def}
            controls={
              <XAxisSelect
                value={def.xAxis}
                choices={FIXED_CHARTS[k].xChoices}
                onChange={(c) => setXOf(def.key, c)}
              />
            }
            {...common}
          />
        ))}
      </div>
      <p className="text-xs text-ink-faint">
        Marks: ○ damage onset, ◆ peak stress, ✕ failure flag. Click a point to move the increment
        cursor. Curves are thinned for display (turning points kept); exports carry every increment.
      </p>
    </div>
  );
}

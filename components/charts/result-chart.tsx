"use client";

import { useEffect, useId, useMemo, useRef } from "react";
import type { ChartDef } from "@/lib/client/loading-desk/chart-defs";
import { type ChartOverlay, overlayTraces } from "@/lib/client/loading-desk/chart-overlays";
import { buildChart, type TraceSource } from "@/lib/client/loading-desk/chart-traces";
import { chartImageName } from "@/lib/client/loading-desk/file-names";
import { imageStamp, stampedLayout } from "@/lib/client/loading-desk/image-stamp";
import { emitEvent } from "@/lib/client/loading-desk/instrumentation";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";
import { fitChartToBox, Plot, resetChartZoom, saveChartImage } from "./plot";
import { chartLayout, CHART_CONFIG } from "./chart-layout";
import { useDrawVersion } from "./use-draw-version";
import { useEnlarged } from "./use-enlarged";

const NO_OVERLAYS: readonly ChartOverlay[] = [];

const buttonCls =
  "rounded border border-glaze-line px-2 py-0.5 text-xs text-ink-soft hover:bg-glaze-deep";

export interface ResultChartProps {
  def: ChartDef;
  store: ResultsStore;
  entries: SetEntry[];
  cursor: number | null;
  onCursor: (step: number) => void;
  scenarioName: string;
  /** "revision 4" when a saved revision is open, else null: stamped on saved images. */
  revision?: string | null;
  /** Extra controls in the chart's heading (e.g. the component pickers). */
  controls?: React.ReactNode;
  /** Measured curves drawn when their axes are this chart's. */
  overlays?: readonly ChartOverlay[];
}

export function ResultChart({
  def,
  store,
  entries,
  cursor,
  onCursor,
  scenarioName,
  revision = null,
  controls,
  overlays = NO_OVERLAYS,
}: ResultChartProps) {
  const version = useDrawVersion(store);
  const graph = useRef<HTMLElement | null>(null);
  const box = useRef<HTMLElement | null>(null);
  const opener = useRef<HTMLButtonElement | null>(null);
  const headingId = useId();
  const { enlarged, toggle, close, onKeyDown } = useEnlarged(box, opener);
  // The plot's box changed size with the dialog: Plotly only follows window resizes itself.
  useEffect(() => {
    if (graph.current) void fitChartToBox(graph.current);
  }, [enlarged]);
  // Only what is drawn of each set: a parameter edit must not redraw the old curves at once;
  // the new rows arrive through the store and redraw one chart per task.
  const look = JSON.stringify(entries.map((e) => [e.set.id, e.color, e.visible, e.set.label]));
  const built = useMemo(() => {
    const sources: TraceSource[] = [];
    for (const [id, color, visible, label] of JSON.parse(look) as [
      string,
      string,
      boolean,
      string,
    ][]) {
      const buf = store.get(id)?.buffer;
      if (!visible || !buf) continue;
      sources.push({ id, label, color, columns: buf.columns, rows: buf.rows });
    }
    return {
      ...buildChart(def, sources, cursor),
      version,
      gen: store.generation,
      complete: store.settled,
    };
  }, [def, look, cursor, version, store]);
  // Apart from the streamed curves: a record is thinned once per axes or selection change.
  const measured = useMemo(() => overlayTraces(def, overlays), [def, overlays]);
  // Overlays go last so a click's curveNumber still indexes built.rowsOf (they have no steps).
  const data = useMemo(() => [...built.traces, ...measured], [built.traces, measured]);
  const empty = data.length === 0;
  const layout = useMemo(() => chartLayout(def, empty), [def, empty]);

  const drawn = (_fig: unknown, gd: HTMLElement) => {
    graph.current = gd;
    emitEvent("chart-drawn", {
      chart: def.key,
      gen: built.gen,
      complete: built.complete,
      version: built.version,
    });
  };

  const save = (format: "png" | "svg") => {
    if (!graph.current) return;
    const stamp = imageStamp({
      chartTitle: def.title,
      scenarioName,
      revision,
      sets: entries.filter((e) => e.visible).map((e) => ({ id: e.set.id, label: e.set.label })),
    });
    void saveChartImage(graph.current, format, chartImageName(scenarioName, def.title), (l) =>
      stampedLayout(l, stamp),
    );
  };

  return (
    <>
      {enlarged && (
        <div className="fixed inset-0 z-40 bg-ink/40" aria-hidden="true" onClick={close} />
      )}
      <figure
        ref={box}
        className={
          enlarged
            ? "fixed inset-2 z-50 flex min-w-0 flex-col rounded-lg border border-glaze-line bg-white p-3 shadow-xl sm:inset-6"
            : "flex min-w-0 flex-col rounded-lg border border-glaze-line bg-white p-3"
        }
        data-chart={def.key}
        data-enlarged={enlarged ? "true" : undefined}
        role={enlarged ? "dialog" : undefined}
        aria-modal={enlarged ? true : undefined}
        aria-labelledby={headingId}
        onKeyDown={onKeyDown}
      >
        <figcaption className="flex flex-wrap items-center gap-2">
          <h3 id={headingId} className="font-display text-sm font-semibold">
            {def.title}
          </h3>
          {controls}
          <span className="ml-auto flex flex-wrap gap-1">
            <button
              type="button"
              onClick={() => graph.current && void resetChartZoom(graph.current)}
              className={buttonCls}
              aria-label={`Reset zoom of ${def.title}`}
            >
              Reset
            </button>
            {(["png", "svg"] as const).map((f) => (
              <button
                key={f}
                type="button"
                onClick={() => save(f)}
                className={buttonCls}
                aria-label={`Save ${def.title} as ${f.toUpperCase()}`}
              >
                {f.toUpperCase()}
              </button>
            ))}
            <button
              ref={opener}
              type="button"
              onClick={toggle}
              className={buttonCls}
              aria-label={enlarged ? `Close enlarged ${def.title}` : `Enlarge ${def.title}`}
            >
              {enlarged ? "Close" : "Enlarge"}
            </button>
          </span>
        </figcaption>
        <div className={enlarged ? "min-h-0 w-full flex-1" : "h-64 w-full"}>
          <Plot
            data={data}
            layout={layout}
            config={CHART_CONFIG}
            useResizeHandler
            style={{ width: "100%", height: "100%" }}
            onInitialized={drawn}
            onUpdate={drawn}
            onClick={(e: { points?: { curveNumber: number; pointIndex: number }[] }) => {
              const p = e.points?.[0];
              const rows = p ? built.rowsOf[p.curveNumber] : undefined;
              if (p && rows) onCursor(rows[p.pointIndex]);
            }}
          />
        </div>
        <p className="mt-1 text-[11px] text-ink-faint">
          Drag to zoom · double-click or Reset to fit · hover a curve for its values
        </p>
      </figure>
    </>
  );
}

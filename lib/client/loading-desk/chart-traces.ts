/**
 * Plotly traces of one chart for every visible set: decimated curves (the full rows stay in the
 * buffers for export), onset / peak / failure marks and the shared increment cursor.
 */
import type { ResultColumns } from "@/lib/mechanics/types";
import type { ChartDef } from "./chart-defs";
import { decimateIndices, pick } from "./decimate";
import { findMarks } from "./marks";
import { setLineStyle, setStyleIndex } from "./set-line-style";

/** Buckets per curve: ≤ 6 points each, ~1,500 points per trace at most. */
export const DISPLAY_BUCKETS = 250;

export interface TraceSource {
  id: string;
  label: string;
  color: string;
  columns: ResultColumns;
  rows: number;
}

export interface ChartTrace {
  type: "scatter";
  mode: "lines" | "markers";
  x: number[];
  y: number[];
  name: string;
  legendgroup: string;
  showlegend: boolean;
  meta: { set: string; series: string };
  line?: { color: string; dash: string; width: number };
  marker?: { color: string; size: number; symbol: string | string[]; line?: object };
  text?: string[];
  /** The increment of each point, for the hover readout when x is not the increment. */
  customdata?: number[];
  hovertemplate: string;
}

/** Row indices behind each trace's points, for mapping a click back to an increment. */
export interface BuiltChart {
  traces: ChartTrace[];
  rowsOf: Int32Array[];
}

const MARK_NAMES = { onset: "damage onset", peak: "peak", failure: "failure" } as const;
const MARK_SYMBOLS = { onset: "circle-open", peak: "diamond", failure: "x" } as const;

export function buildChart(
  def: ChartDef,
  sources: TraceSource[],
  cursor: number | null,
): BuiltChart {
  const traces: ChartTrace[] = [];
  const rowsOf: Int32Array[] = [];
  // The readout at the cursor: both values with units, and the increment unless x already is it.
  const byIncrement = def.xAxis !== "increment";
  const readout = `${def.xTitle}: %{x:.5g}<br>${def.yTitle}: %{y:.5g}${byIncrement ? "<br>increment %{customdata}" : ""}`;
  const incrementsAt = (src: TraceSource, idx: Int32Array) =>
    byIncrement ? pick(src.columns.increment, idx) : undefined;
  for (const src of sources) {
    if (src.rows === 0) continue;
    const tag = `${src.id}${src.label ? `: ${src.label}` : ""}`;
    def.series.forEach((s, k) => {
      const idx = decimateIndices(src.columns[s.x], src.columns[s.y], src.rows, DISPLAY_BUCKETS);
      rowsOf.push(idx);
      traces.push({
        type: "scatter",
        mode: "lines",
        x: pick(src.columns[s.x], idx),
        y: pick(src.columns[s.y], idx),
        name: def.series.length > 1 ? `${src.id} · ${s.name}` : tag,
        legendgroup: src.id,
        showlegend: k === 0 || def.series.length > 1,
        meta: { set: src.id, series: s.key },
        line: {
          color: src.color,
          ...setLineStyle(setStyleIndex(src.color), s.dash, def.series.length),
        },
        customdata: incrementsAt(src, idx),
        hovertemplate: `${s.name}<br>${readout}<extra>${tag}</extra>`,
      });
    });
    const s0 = def.series[0];
    const extra: { rows: number[]; names: string[]; symbols: string[] } = {
      rows: [],
      names: [],
      symbols: [],
    };
    if (def.marks) {
      const stress = s0.y.startsWith("sig") ? (s0.y as "sig11" | "sig22" | "sig12") : "sig11";
      const marks = findMarks(src.columns, src.rows, stress);
      for (const key of ["onset", "peak", "failure"] as const) {
        const row = marks[key];
        if (row === null) continue;
        extra.rows.push(row);
        extra.names.push(
          key === "failure" && marks.broken !== null
            ? `family ${marks.broken} breaks (d${marks.broken} = dmax)`
            : MARK_NAMES[key],
        );
        extra.symbols.push(MARK_SYMBOLS[key]);
      }
    }
    if (cursor !== null && cursor < src.rows) {
      extra.rows.push(cursor);
      extra.names.push(`increment ${cursor}`);
      extra.symbols.push("circle");
    }
    if (extra.rows.length === 0) continue;
    const rows = Int32Array.from(extra.rows);
    rowsOf.push(rows);
    traces.push({
      type: "scatter",
      mode: "markers",
      x: pick(src.columns[s0.x], rows),
      y: pick(src.columns[s0.y], rows),
      name: `${tag} marks`,
      legendgroup: src.id,
      showlegend: false,
      meta: { set: src.id, series: "marks" },
      marker: {
        color: src.color,
        size: 10,
        symbol: extra.symbols,
        line: { width: 2, color: src.color },
      },
      text: extra.names,
      customdata: incrementsAt(src, rows),
      hovertemplate: `%{text}<br>${readout}<extra>${tag}</extra>`,
    });
  }
  return { traces, rowsOf };
}

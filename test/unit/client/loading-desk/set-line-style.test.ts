/** Two nearly equal sets stay apart: each set has its own line style besides its colour. */
import { describe, expect, it } from "vitest";
import { RESULT_COLUMNS, type ResultColumns } from "@/lib/mechanics/types";
import { FIXED_CHARTS, stressStrainDef } from "@/lib/client/loading-desk/chart-defs";
import { buildChart, type TraceSource } from "@/lib/client/loading-desk/chart-traces";
import { SET_COLORS } from "@/lib/client/loading-desk/set-colors";
import {
  SET_DASHES,
  setLineStyle,
  setStyleIndex,
  svgDashArray,
} from "@/lib/client/loading-desk/set-line-style";

function source(id: string, color: string): TraceSource {
  const rows = 20;
  const columns = {} as ResultColumns;
  for (const c of RESULT_COLUMNS) columns[c] = new Float64Array(rows);
  for (let i = 0; i < rows; i++) {
    columns.increment[i] = i;
    columns.eps11[i] = i * 1e-4;
    columns.sig11[i] = i;
  }
  return { id, label: id, color, columns, rows };
}

describe("set line styles", () => {
  it("gives every set slot its own dash and a line no wider than the one before", () => {
    expect(SET_DASHES).toHaveLength(SET_COLORS.length);
    expect(new Set(SET_DASHES).size).toBe(SET_DASHES.length);
    const styles = SET_COLORS.map((_, i) => setLineStyle(i));
    expect(styles.map((s) => s.dash)).toEqual([...SET_DASHES]);
    for (let i = 1; i < styles.length; i++)
      expect(styles[i].width).toBeLessThanOrEqual(styles[i - 1].width);
    expect(styles[1].width).toBeLessThan(styles[0].width);
  });

  it("follows the set's colour, so a set keeps its style when others are removed", () => {
    expect(setStyleIndex(SET_COLORS[2])).toBe(2);
    expect(setStyleIndex("#000000")).toBe(0);
  });

  it("keeps the chart's dash for the curves of a set when a chart draws several per set", () => {
    expect(setLineStyle(1, "dash", 2).dash).toBe("dash");
    expect(setLineStyle(1, "solid", 2).dash).toBe("solid");
    expect(setLineStyle(1, "solid", 2).width).toBeLessThan(setLineStyle(0, "solid", 2).width);
  });

  it("draws sets A and B on the desk's stress–strain chart solid and dashed", () => {
    const built = buildChart(
      stressStrainDef("eps11", "sig11"),
      [source("A", SET_COLORS[0]), source("B", SET_COLORS[1])],
      null,
    );
    const [a, b] = built.traces.filter((t) => t.meta.series === "curve");
    expect(a.line?.dash).toBe("solid");
    expect(b.line?.dash).toBe("dash");
    expect(b.line!.width).toBeLessThan(a.line!.width);
  });

  it("keeps d1 solid and d2 dashed on the damage chart, sets told apart by width", () => {
    const def = FIXED_CHARTS.find((c) => c.series.some((s) => s.y === "d2"))!;
    const built = buildChart(def, [source("A", SET_COLORS[0]), source("B", SET_COLORS[1])], null);
    const lines = built.traces.filter((t) => t.mode === "lines");
    expect(lines.map((t) => t.line?.dash)).toEqual(["solid", "dash", "solid", "dash"]);
    expect(lines[2].line!.width).toBeLessThan(lines[0].line!.width);
  });

  it("writes the dashes as SVG dash arrays scaled by the line width", () => {
    expect(svgDashArray("solid", 2)).toBeUndefined();
    expect(svgDashArray("dash", 2)).toBe("8 6");
    expect(svgDashArray("dot", 1.5)).toBe("1.5 3");
  });
});

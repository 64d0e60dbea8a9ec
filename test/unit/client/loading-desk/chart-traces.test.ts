import { describe, expect, it } from "vitest";
import { RESULT_COLUMNS, type ResultColumns } from "@/lib/mechanics/types";
import { FIXED_CHARTS, stressStrainDef } from "@/lib/client/loading-desk/chart-defs";
import {
  buildChart,
  DISPLAY_BUCKETS,
  type TraceSource,
} from "@/lib/client/loading-desk/chart-traces";

function source(id: string, rows: number): TraceSource {
  const columns = {} as ResultColumns;
  for (const c of RESULT_COLUMNS) columns[c] = new Float64Array(rows);
  for (let i = 0; i < rows; i++) {
    columns.increment[i] = i;
    columns.eps11[i] = i * 1e-4;
    columns.sig11[i] = i < rows / 2 ? i : rows - i;
    columns.d1[i] = i > 10 ? 0.001 * i : 0;
    columns.failed[i] = i === rows - 1 ? 1 : 0;
  }
  return { id, label: `set ${id}`, color: "#123456", columns, rows };
}

describe("chart traces", () => {
  it("draws one curve per set and series, thinned, with units in the hover text", () => {
    const built = buildChart(
      stressStrainDef("eps11", "sig11"),
      [source("A", 50_000), source("B", 100)],
      null,
    );
    const curves = built.traces.filter((t) => t.meta.series === "curve");
    expect(curves.map((t) => t.meta.set)).toEqual(["A", "B"]);
    expect(curves[0].x.length).toBeLessThanOrEqual(DISPLAY_BUCKETS * 6);
    expect(curves[1].x).toHaveLength(100);
    expect(curves[0].hovertemplate).toContain("σ11 (MPa)");
    expect(curves[0].hovertemplate).toContain("ε11 (mm/mm)");
    expect(built.rowsOf).toHaveLength(built.traces.length);
  });

  it("marks damage onset, peak and failure at their rows, and the increment cursor", () => {
    const built = buildChart(stressStrainDef("eps11", "sig11"), [source("A", 100)], 42);
    const marks = built.traces.find((t) => t.meta.series === "marks")!;
    expect(marks.text).toEqual(["damage onset", "peak", "failure", "increment 42"]);
    expect(Array.from(built.rowsOf[built.traces.indexOf(marks)])).toEqual([11, 50, 99, 42]);
    expect(marks.y[1]).toBe(50);
  });

  it("calls the failure mark a break of its family when the path goes on past it", () => {
    const src = source("A", 100);
    for (let i = 0; i < 100; i++) src.columns.failed[i] = i >= 70 ? 1 : 0;
    const built = buildChart(stressStrainDef("eps11", "sig11"), [src], null);
    const marks = built.traces.find((t) => t.meta.series === "marks")!;
    expect(marks.text).toEqual(["damage onset", "peak", "family 1 breaks (d1 = dmax)"]);
  });

  it("skips sets without rows and draws every series of a fixed chart", () => {
    const energy = FIXED_CHARTS.find((c) => c.key === "energy")!;
    const built = buildChart(energy, [source("A", 20), { ...source("B", 0) }], null);
    expect(built.traces.map((t) => t.meta.series)).toEqual(["W", "psi", "Phi"]);
  });
});

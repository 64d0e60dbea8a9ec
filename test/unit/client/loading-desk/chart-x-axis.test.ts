import { describe, expect, it } from "vitest";
import { RESULT_COLUMNS, type ResultColumns } from "@/lib/mechanics/types";
import { FIXED_CHARTS, stressStrainDef } from "@/lib/client/loading-desk/chart-defs";
import { withXAxis, xAxisTitle } from "@/lib/client/loading-desk/chart-x-axis";
import { buildChart } from "@/lib/client/loading-desk/chart-traces";

const chart = (key: string) => FIXED_CHARTS.find((c) => c.key === key)!;

function source(rows: number) {
  const columns = {} as ResultColumns;
  for (const c of RESULT_COLUMNS) columns[c] = new Float64Array(rows);
  for (let i = 0; i < rows; i++) {
    columns.increment[i] = i;
    columns.eps11[i] = i * 1e-4;
    columns.sig11[i] = 10 * i;
    columns.d1[i] = 0.01 * i;
    columns.d2[i] = 0.02 * i;
  }
  return { id: "A", label: "", color: "#123456", columns, rows };
}

describe("the horizontal axis of a chart", () => {
  it("defaults to what each chart drew before: increment, or each family's own damage", () => {
    expect(FIXED_CHARTS.map((c) => [c.key, c.xAxis, c.xChoices[0]])).toEqual([
      ["damage", "increment", "increment"],
      ["force", "damage", "damage"],
      ["permanent-strain", "increment", "increment"],
      ["energy", "increment", "increment"],
    ]);
    expect(chart("damage").series.map((s) => s.x)).toEqual(["increment", "increment"]);
    expect(chart("force").series.map((s) => s.x)).toEqual(["d1", "d2"]);
  });

  it("offers the increment and every strain component everywhere, stress where it reads as a threshold", () => {
    for (const c of FIXED_CHARTS)
      expect(c.xChoices).toEqual(expect.arrayContaining(["increment", "eps11", "eps22", "gam12"]));
    expect(chart("damage").xChoices).toEqual(expect.arrayContaining(["sig11", "sig22", "sig12"]));
    expect(chart("permanent-strain").xChoices).toContain("sig12");
    expect(chart("energy").xChoices).not.toContain("sig11");
  });

  it("titles the axis by symbol with its unit", () => {
    expect(xAxisTitle("eps11")).toBe("ε11 (mm/mm)");
    expect(xAxisTitle("gam12")).toBe("γ12 (mm/mm)");
    expect(xAxisTitle("sig22")).toBe("σ22 (MPa)");
    expect(xAxisTitle("increment")).toBe("increment");
  });

  it("moves every series to the chosen column and says so in the title", () => {
    const def = withXAxis(chart("damage"), "eps11");
    expect(def.key).toBe("damage");
    expect(def.xAxis).toBe("eps11");
    expect(def.title).toBe("Damage against ε11");
    expect(def.xTitle).toBe("ε11 (mm/mm)");
    expect(def.xUnit).toBe("mm/mm");
    expect(def.series.map((s) => [s.x, s.y])).toEqual([
      ["eps11", "d1"],
      ["eps11", "d2"],
    ]);
    const force = withXAxis(chart("force"), "increment");
    expect(force.series.map((s) => [s.x, s.name])).toEqual([
      ["increment", "Ȳ1"],
      ["increment", "Ȳ2"],
    ]);
    expect(withXAxis(chart("permanent-strain"), "sig11").xTitle).toBe("σ11 (MPa)");
  });

  it("gives the chart back unchanged for its own axis or one it does not offer", () => {
    expect(withXAxis(chart("damage"), "increment")).toBe(chart("damage"));
    expect(withXAxis(chart("force"), "damage")).toBe(chart("force"));
    expect(withXAxis(chart("energy"), "sig11")).toBe(chart("energy"));
    const ss = stressStrainDef("eps11", "sig11");
    expect(withXAxis(ss, "increment")).toBe(ss);
  });

  it("draws the chosen column and reads out both values with units and the increment", () => {
    const built = buildChart(withXAxis(chart("damage"), "eps11"), [source(40)], 7);
    const d1 = built.traces.find((t) => t.meta.series === "d1")!;
    expect(d1.x[20]).toBeCloseTo(20e-4, 15);
    expect(d1.y[20]).toBeCloseTo(0.2, 15);
    expect(d1.customdata?.[20]).toBe(20);
    expect(d1.hovertemplate).toContain("ε11 (mm/mm): %{x:.5g}");
    expect(d1.hovertemplate).toContain("damage (–): %{y:.5g}");
    expect(d1.hovertemplate).toContain("increment %{customdata}");
    const marks = built.traces.find((t) => t.meta.series === "marks")!;
    expect(marks.x.at(-1)).toBeCloseTo(7e-4, 15);
    // against the increment the readout does not repeat it
    const plain = buildChart(chart("damage"), [source(40)], null).traces[0];
    expect(plain.customdata).toBeUndefined();
    expect(plain.hovertemplate).not.toContain("customdata");
  });
});

/** The report's key curves draw each set in the desk's style: colour and dash per set. */
import { cleanup, render } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { SvgChart } from "@/components/report/svg-chart";
import { SET_COLORS } from "@/lib/client/loading-desk/set-colors";
import type { ChartGeometry } from "@/lib/server/handoff/report/svg-chart";

afterEach(cleanup);

const chart = (names: string[]): ChartGeometry => ({
  width: 480,
  height: 260,
  paths: names.map((name) => ({ name, d: "M56,200 L400,40" })),
  xTicks: [],
  yTicks: [],
  zero: { x: null, y: null },
});

const curves = (container: HTMLElement) =>
  [...container.querySelectorAll("svg[role=img] path")].map((p) => ({
    stroke: p.getAttribute("stroke"),
    dash: p.getAttribute("stroke-dasharray"),
  }));

describe("report key curves", () => {
  it("draws set A solid and set B dashed, each in its screen colour", () => {
    const { container } = render(
      <SvgChart title="t" chart={chart(["A", "B"])} xTitle="ε11" yTitle="σ11" />,
    );
    const [a, b] = curves(container);
    expect(a).toEqual({ stroke: SET_COLORS[0], dash: null });
    expect(b.stroke).toBe(SET_COLORS[1]);
    expect(b.dash).toMatch(/^\d/);
  });

  it("keeps d1 solid and d2 dashed when a chart draws two curves per set", () => {
    const { container } = render(
      <SvgChart
        title="t"
        chart={chart(["A d1", "A d2", "B d1", "B d2"])}
        xTitle="increment"
        yTitle="d"
        seriesPerSet={2}
      />,
    );
    const lines = curves(container);
    expect(lines.map((l) => l.dash === null)).toEqual([true, false, true, false]);
    const widths = [...container.querySelectorAll("svg[role=img] path")].map((p) =>
      Number(p.getAttribute("stroke-width")),
    );
    expect(widths[2]).toBeLessThan(widths[0]);
  });
});

import { act, cleanup, fireEvent, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { ChartGrid } from "@/components/loading-desk/chart-grid";
import { setIncrementCursor } from "@/lib/client/loading-desk/increment-cursor-store";
import { ResultsStore } from "@/lib/client/loading-desk/results-store";

// Plotly is outside this test: the mock shows the axis title it is given and hands its element
// to the chart as Plotly would, so saving and resizing act on the same element.
const plot = vi.hoisted(() => ({
  save: vi.fn(),
  reset: vi.fn(),
  fit: vi.fn(),
}));
vi.mock("@/components/charts/plot", () => ({
  Plot: (props: {
    layout: { xaxis: { title: { text: string } } };
    onInitialized: (fig: unknown, gd: HTMLElement) => void;
  }) => (
    <div
      data-testid="plot"
      ref={(el) => {
        if (el) props.onInitialized({}, el);
      }}
    >
      x: {props.layout.xaxis.title.text}
    </div>
  ),
  saveChartImage: plot.save,
  resetChartZoom: plot.reset,
  fitChartToBox: plot.fit,
}));

function grid() {
  render(
    <ChartGrid
      store={new ResultsStore()}
      entries={[]}
      scenarioName="Plate"
      revision="revision 2"
      totalIncrements={100}
    />,
  );
  const card = document.querySelector<HTMLElement>('[data-chart="damage"]')!;
  return { card, inCard: within(card) };
}

afterEach(() => {
  cleanup();
  act(() => setIncrementCursor(null));
  vi.clearAllMocks();
});

describe("a chart card of the loading desk", () => {
  it("draws the chart against the horizontal axis chosen, by symbol and unit", () => {
    const { inCard } = grid();
    const select = inCard.getByLabelText("Horizontal axis") as HTMLSelectElement;
    expect(select.value).toBe("increment");
    expect(Array.from(select.options).map((o) => o.text)).toEqual([
      "increment",
      "ε11 (mm/mm)",
      "ε22 (mm/mm)",
      "γ12 (mm/mm)",
      "σ11 (MPa)",
      "σ22 (MPa)",
      "σ12 (MPa)",
    ]);
    expect(inCard.getByTestId("plot").textContent).toBe("x: increment");

    fireEvent.change(select, { target: { value: "eps11" } });
    expect(inCard.getByRole("heading").textContent).toBe("Damage against ε11");
    expect(inCard.getByTestId("plot").textContent).toBe("x: ε11 (mm/mm)");
    // the other charts keep theirs
    const energy = document.querySelector<HTMLElement>('[data-chart="energy"]')!;
    expect(within(energy).getByTestId("plot").textContent).toBe("x: increment");
  });

  it("enlarges into a dialog that Escape closes, focus back on Enlarge", () => {
    const { card, inCard } = grid();
    const enlarge = inCard.getByRole("button", { name: "Enlarge Damage against increment" });
    expect(card.getAttribute("role")).toBeNull();
    enlarge.focus();
    fireEvent.click(enlarge);

    const dialog = screen.getByRole("dialog", { name: "Damage against increment" });
    expect(dialog).toBe(card);
    expect(card.className).toContain("fixed");
    expect(document.body.style.overflow).toBe("hidden");
    expect(plot.fit).toHaveBeenLastCalledWith(inCard.getByTestId("plot"));
    // the axis can be changed in the dialog too
    fireEvent.change(inCard.getByLabelText("Horizontal axis"), { target: { value: "sig11" } });
    expect(inCard.getByTestId("plot").textContent).toBe("x: σ11 (MPa)");
    inCard.getByLabelText("Horizontal axis").focus();

    fireEvent.keyDown(document, { key: "Escape" });
    expect(screen.queryByRole("dialog")).toBeNull();
    expect(card.className).not.toContain("fixed");
    expect(document.body.style.overflow).toBe("");
    expect(document.activeElement).toBe(
      inCard.getByRole("button", { name: "Enlarge Damage against σ11" }),
    );
  });

  it("closes by its Close button or the backdrop", () => {
    const { card, inCard } = grid();
    fireEvent.click(inCard.getByRole("button", { name: /^Enlarge/ }));
    fireEvent.click(
      inCard.getByRole("button", { name: "Close enlarged Damage against increment" }),
    );
    expect(card.getAttribute("role")).toBeNull();
    fireEvent.click(inCard.getByRole("button", { name: /^Enlarge/ }));
    fireEvent.click(document.querySelector<HTMLElement>(".fixed.inset-0")!);
    expect(card.getAttribute("role")).toBeNull();
  });

  it("saves the enlarged chart stamped with its title, axis and revision, and resets its zoom", () => {
    const { inCard } = grid();
    fireEvent.change(inCard.getByLabelText("Horizontal axis"), { target: { value: "eps11" } });
    fireEvent.click(inCard.getByRole("button", { name: /^Enlarge/ }));
    expect(inCard.getByText(/Drag to zoom · double-click or Reset to fit/)).toBeTruthy();
    fireEvent.click(inCard.getByRole("button", { name: "Reset zoom of Damage against ε11" }));
    expect(plot.reset).toHaveBeenCalledWith(inCard.getByTestId("plot"));

    fireEvent.click(inCard.getByRole("button", { name: "Save Damage against ε11 as SVG" }));
    const [gd, format, name, layoutFor] = plot.save.mock.calls[0];
    expect(gd).toBe(inCard.getByTestId("plot"));
    expect(format).toBe("svg");
    expect(name).toMatch(/^craquelure-plate-damage-against-ε11-/);
    const stamped = layoutFor({ margin: { t: 8 } }) as { title: { text: string } };
    expect(stamped.title.text).toContain("Damage against ε11 · Plate (revision 2)");
    expect(stamped.title.text).toContain("no design allowable");
  });
});

import { readFileSync } from "node:fs";
import path from "node:path";

import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";

import { previewCsv } from "@/lib/shared/records/csv-preview";

// The CSV worker does not run under happy-dom: the preview runs inline (it is the same pure
// function the worker wraps), and the chart shows its points as text instead of drawing them.
vi.mock("@/workers/use-csv-preview", () => ({
  useCsvPreview: (text: string, mapping: Parameters<typeof previewCsv>[1]) =>
    previewCsv(text, mapping),
}));
vi.mock("@/components/records/curve-chart", () => ({
  CurveChart: ({ traces }: { traces: { x: number[]; y: number[] }[] }) => (
    <output data-testid="curve">
      {traces[0].x.map((x, i) => `${x.toPrecision(4)}:${traces[0].y[i].toPrecision(4)}`).join(" ")}
    </output>
  ),
}));

const { UploadCard } = await import("@/components/records/upload-card");

// Issue 14 item 1: the upload of a machine file (invented, test/fixtures/machine/README.md).
const KN_PERCENT = readFileSync(
  path.join(process.cwd(), "test/fixtures/machine/tension-kn-percent.csv"),
  "utf8",
);

afterEach(cleanup);

function renderCard() {
  render(
    <UploadCard
      index={0}
      teamSlug="t"
      file={{ name: "tension-kn-percent.csv", text: KN_PERCENT }}
      onSaved={() => {}}
      onRemove={() => {}}
    />,
  );
}

const save = () => screen.getByRole("button", { name: "Save test record" });
const type = (label: string, value: string) =>
  fireEvent.change(screen.getByLabelText(label), { target: { value } });

describe("upload of a machine file", () => {
  it("shows the detected layout, and the preview table reads past the metadata block", () => {
    renderCard();
    expect(screen.getByLabelText("Lines to skip")).toHaveProperty("value", "8");
    expect(screen.getByLabelText("Unit row under the header")).toHaveProperty("checked", true);
    expect(screen.getByLabelText("Delimiter")).toHaveProperty("value", ";");
    expect(screen.getByLabelText("Decimal mark")).toHaveProperty("value", "comma");
    const table = screen.getByRole("table", { name: "First rows as read" });
    expect(table.textContent).toContain("Force [kN]");
    expect(table.textContent).toContain("1.25"); // "1,250" on line 14
  });

  it("keeps saving off and says what is missing until the geometry is typed", () => {
    renderCard();
    // The suggestion maps force and the % strain column; without a section there is no stress.
    expect(save()).toHaveProperty("disabled", true);
    expect(
      screen.getByText("Give the specimen's width in mm to convert force to stress."),
    ).toBeTruthy();
    type("Width (mm)", "10");
    expect(save()).toHaveProperty("disabled", true);
    const why = screen.getByText("Give the specimen's thickness in mm to convert force to stress.");
    expect(save().getAttribute("aria-describedby")).toBe(why.id);
    type("Thickness (mm)", "4");
    expect(save()).toHaveProperty("disabled", false);
    // Converted preview: line 14 gives 0.375 % → 0.00375 and 1250 N / 40 mm² = 31.25 MPa.
    expect(screen.getByTestId("curve").textContent).toContain("0.003750:31.25");
  });

  it("a changed layout changes the preview: without the unit row, line 10 is not a number", () => {
    renderCard();
    fireEvent.click(screen.getByLabelText("Unit row under the header"));
    expect(screen.getByRole("table", { name: "First rows as read" }).textContent).toContain(
      "not a number",
    );
  });
});

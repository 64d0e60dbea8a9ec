import { cleanup, render, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { HandoffPanel } from "@/components/handoff/handoff-panel";
import { largestDeviation, type ConformanceVerdict } from "@/lib/shared/conformance-verdict";

// Issue 13 item 4: one "Hand-off" panel per revision with its latest conformance verdict.
afterEach(cleanup);

const failed: ConformanceVerdict = {
  passed: false,
  checkedAt: "2026-12-04T10:30:00.000Z",
  fileName: "fe-history.csv",
  firstFailIncrement: 212,
  largest: { quantity: "sig12", maxAbs: 1.23456 },
};

function renderPanel(latest: ConformanceVerdict | null) {
  render(<HandoffPanel team="demo" scenarioId="s-1" revision={3} latest={latest} />);
  return screen.getByRole("region", { name: "Hand-off" });
}

describe("HandoffPanel", () => {
  it("shows the latest verdict with date, file and the largest deviation by symbol", () => {
    const panel = renderPanel(failed);
    const verdict = within(panel).getByTestId("handoff-verdict").textContent ?? "";
    expect(verdict).toContain("fail from increment 212");
    expect(verdict).toContain("2026-12-04 10:30 UTC");
    expect(verdict).toContain("fe-history.csv");
    expect(verdict).toContain("σ12: 1.23");
    expect(verdict).not.toContain("sig12");
    expect(within(panel).queryByText("No conformance check yet.")).toBeNull();
  });

  it("says pass for a passing check", () => {
    const panel = renderPanel({ ...failed, passed: true, firstFailIncrement: null });
    expect(within(panel).getByTestId("handoff-verdict").textContent).toMatch(/^pass /);
  });

  it("says so when the revision has no check, and still offers every hand-off link", () => {
    const panel = renderPanel(null);
    expect(within(panel).getByText("No conformance check yet.")).toBeTruthy();
    expect(within(panel).queryByTestId("handoff-verdict")).toBeNull();
    const links = within(within(panel).getByTestId("handoff-links")).getAllByRole("link");
    const base = "/teams/demo/scenarios/s-1/revisions/3";
    expect(links.map((a) => [a.textContent, a.getAttribute("href")])).toEqual([
      ["Conformance check", `${base}/conformance`],
      ["Parameter study", `${base}/study`],
      ["Calibration report", "/reports/demo/s-1/3"],
      ["Reference bundle (zip)", `/api/v1${base}/bundle`],
    ]);
  });
});

describe("largestDeviation", () => {
  it("weighs each quantity by its own tolerance, so a damage can outrank a stress", () => {
    const worst = largestDeviation([
      { quantity: "sig11", maxAbs: 0.5, tolerance: 0.7 },
      { quantity: "d1", maxAbs: 0.006, tolerance: 0.005 },
    ]);
    expect(worst).toEqual({ quantity: "d1", maxAbs: 0.006 });
  });

  it("is null without quantities", () => {
    expect(largestDeviation([])).toBeNull();
  });
});

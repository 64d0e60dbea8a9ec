import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { ConformanceResultTable } from "@/components/conformance/result-table";
import { ConformanceSummary } from "@/components/report/conformance-summary";
import type { ConformanceResult } from "@/lib/server/handoff/conformance/types";
import { quantitySymbol } from "@/lib/shared/quantity-symbols";

// People read σ22, not the file's column name sig22 (issue 16): the conformance table on its
// page and the report's summary both show the symbols.
afterEach(cleanup);

const result: ConformanceResult = {
  setId: "A",
  tolerance: { stressFraction: 0.01, damage: 0.005 },
  points: 10,
  peakStress: 70,
  passed: true,
  firstFailIncrement: null,
  quantities: [
    {
      quantity: "sig11",
      tolerance: 0.7,
      maxAbs: 0.01,
      rms: 0.005,
      maxRel: 0,
      firstFailIncrement: null,
      passed: true,
    },
    {
      quantity: "sig22",
      tolerance: 0.7,
      maxAbs: 0.5,
      rms: 0.1,
      maxRel: 0,
      firstFailIncrement: null,
      passed: true,
    },
    {
      quantity: "d1",
      tolerance: 0.005,
      maxAbs: 0.0001,
      rms: 0,
      maxRel: 0,
      firstFailIncrement: null,
      passed: true,
    },
  ],
};

describe("conformance quantities in symbols", () => {
  it("maps the contract's names and leaves unknown ones as they are", () => {
    expect(["sig11", "sig22", "sig12", "eps22", "gam12", "d2", "W"].map(quantitySymbol)).toEqual([
      "σ11",
      "σ22",
      "σ12",
      "ε22",
      "γ12",
      "d2",
      "W",
    ]);
  });

  it("the result table names each row by its symbol", () => {
    render(<ConformanceResultTable result={result} />);
    const table = screen.getByTestId("conformance-result");
    expect(table.textContent).toContain("σ22");
    expect(table.textContent).not.toMatch(/sig\d\d/);
  });

  it("the report's summary names the largest deviation by its symbol", () => {
    const checks = [
      {
        id: "c1",
        createdAt: new Date("2026-12-04T10:00:00Z"),
        fileName: "fe.csv",
        setId: "A",
        passed: true,
        firstFailIncrement: null,
        result,
      },
    ];
    render(<ConformanceSummary checks={checks as never} />);
    expect(screen.getByTestId("report-conformance").textContent).toContain("σ22: 0.5");
  });
});

import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { ResultsTable } from "@/components/loading-desk/results-table";
import { ParameterTable } from "@/components/report/parameter-table";
import { PRESETS } from "@/lib/client/loading-desk/presets";
import type { ResultsStore } from "@/lib/client/loading-desk/results-store";
import type { SetEntry } from "@/lib/client/loading-desk/set-list";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

// Issue 16: people read symbols with units and choices in words; the file's names stay in
// the files (and beside the words, so the simulation team can still type them).
afterEach(cleanup);

const set = { ...PRESETS[0].params, id: "A" } as ParameterSet;

describe("tables in the reader's words", () => {
  it("the report's parameter table writes choices in words with the file's word", () => {
    render(<ParameterTable sets={[{ ...set, onFailure: "stop", law: "sqrtY" }]} />);
    const table = screen.getByTestId("report-parameters");
    expect(table.textContent).toContain("end the path (stop)");
    expect(table.textContent).toContain("d linear in √Ȳ (sqrtY)");
  });

  it("the report's parameter table prints fitted values to six significant digits", () => {
    render(<ParameterTable sets={[{ ...set, E1: 10994.028523930534, nu12: 0.31234567891 }]} />);
    const table = screen.getByTestId("report-parameters");
    expect(table.textContent).toContain("10994");
    expect(table.textContent).not.toContain("10994.0285");
    expect(table.textContent).toContain("0.312346");
  });

  it("the results table heads its columns with symbols and units", () => {
    const store = {
      get: () => undefined,
      subscribe: () => () => {},
      version: () => 0,
    } as unknown as ResultsStore;
    const entries = [{ set, visible: true, color: "#336" }] as unknown as SetEntry[];
    render(<ResultsTable store={store} entries={entries} />);
    const heads = screen.getAllByRole("columnheader").map((h) => h.textContent);
    expect(heads).toContain("σ11 [MPa]");
    expect(heads).toContain("ε22 [-]");
    expect(heads).not.toContain("sig11");
  });
});

import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { ProvenanceList } from "@/components/report/provenance-list";
import { fitUncertainty } from "@/lib/calibration/uncertainty";
import type { SetProvenance } from "@/lib/server/handoff/report/provenance";

// The report's provenance line of a typed library set: the seeded note ends with its own full
// stop, and the line once read "Invented demonstration values.. No test records …".
afterEach(cleanup);

const typed: SetProvenance = {
  setId: "B",
  libraryName: "Demo SMC (invented values)",
  libraryVersion: 1,
  latestVersion: 1,
  librarySource: "library set 'Demo SMC (invented values)', version 1",
  kind: "typed",
  method: null,
  note: "The demo set of the law's specification. Invented demonstration values.",
  records: [],
  fittedAt: null,
  warnings: [],
  uncertainty: null,
  law: "sqrtY",
};

describe("ProvenanceList", () => {
  it("prints a refinement's intervals beside its records (issue 14)", () => {
    const uncertainty = fitUncertainty(
      [0, 1, 2, 3, 4].map((x) => [1, x]),
      [0.1, -0.1, 0.05, -0.05, 0],
      ["E1", "a1"],
      [1, 1],
      [11000, 0.6],
    );
    render(<ProvenanceList items={[{ ...typed, kind: "fitted", uncertainty }]} />);
    const text = screen.getByTestId("report-provenance").textContent ?? "";
    expect(text).toContain("How sure the refined values are");
    expect(text).toContain(uncertainty!.params[0].se!.toPrecision(2));
  });

  it("keeps one full stop between a note and the no-records sentence", () => {
    render(<ProvenanceList items={[typed]} />);
    const text = screen.getByTestId("report-provenance").textContent ?? "";
    expect(text).toContain(
      "Invented demonstration values. No test records are linked to this set.",
    );
    expect(text).not.toContain("..");
  });

  it("prints a note without a full stop unchanged", () => {
    render(<ProvenanceList items={[{ ...typed, note: "Typed in from a data sheet" }]} />);
    expect(screen.getByTestId("report-provenance").textContent).toContain(
      "Typed in from a data sheet. No test records are linked to this set.",
    );
  });
});

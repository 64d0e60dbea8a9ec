import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";

import { ProvenanceList } from "@/components/report/provenance-list";
import type { SetProvenance } from "@/lib/server/handoff/report/provenance";

// The report's provenance line of a typed library set: the seeded note ends with its own full
// stop, and the line once read "Invented demonstration values.. No test records …".
afterEach(cleanup);

const typed: SetProvenance = {
  setId: "B",
  libraryName: "Demo SMC (invented values)",
  kind: "typed",
  method: null,
  note: "The demo set of the law's specification. Invented demonstration values.",
  records: [],
  fittedAt: null,
  warnings: [],
};

describe("ProvenanceList", () => {
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

import { describe, expect, it } from "vitest";
import { provenance, provenanceText } from "@/lib/client/loading-desk/provenance";
import { CAUTION_LINES } from "@/lib/shared/caution";
import type { ParameterSet } from "@/lib/scenario/parameter-set-schema";

// Invented values, enough to see them carried through; the provenance does not read them.
const set = { id: "A", label: "demo set", E1: 9000, nu12: 0.3 } as unknown as ParameterSet;

describe("results provenance side file", () => {
  const input = {
    scenario: "Plate A",
    revision: "revision 4",
    sets: [set],
    path: { legs: [] },
    csvFile: "craquelure-plate-a-set-a-demo-set-2026-03-04.csv",
    date: new Date("2026-03-04T10:00:00Z"),
  };

  it("names scenario, revision, sets with their values, date, digits and the caution", () => {
    const p = provenance(input);
    expect(p.scenario).toBe("Plate A");
    expect(p.revision).toBe("revision 4");
    expect(p.exportedAt).toBe("2026-03-04T10:00:00.000Z");
    expect(p.csvFile).toBe(input.csvFile);
    expect(p.numbers).toBe("10 significant digits");
    expect(p.sets).toEqual([{ id: "A", label: "demo set", values: { E1: 9000, nu12: 0.3 } }]);
    expect(p.units).toContain("σ11 [MPa]");
    expect(p.caution).toEqual([...CAUTION_LINES]);
  });

  it("says when the data was never saved, and is JSON", () => {
    const text = provenanceText({ ...input, revision: null });
    expect(JSON.parse(text).revision).toBe("not saved (scratch data)");
  });
});

import { describe, expect, it } from "vitest";

import {
  libraryProvenanceText,
  recordNameOf,
  toLibraryChoice,
} from "@/lib/client/sets/library-choice";

const fitted = {
  id: "5b0c6f3e-1111-4222-8333-944455556666",
  name: "SMC fit December",
  values: { E1: 11000, label: "old label" },
  provenance: {
    kind: "fitted",
    records: [
      "cyclic 0° (0a1b2c3d-0000-4000-8000-000000000001)",
      "cyclic 90° (0a1b2c3d-0000-4000-8000-000000000002)",
    ],
    method: "identification",
  },
  createdBy: { name: "Ada Editor" },
  createdAt: "2026-12-03T10:00:00.000Z",
};

describe("library choice", () => {
  it("names the records a fit used, without their ids, with author and date", () => {
    expect(libraryProvenanceText(fitted)).toBe(
      "fitted from cyclic 0°, cyclic 90° by Ada Editor, 2026-12-03",
    );
  });

  it("keeps a record name that merely ends in brackets", () => {
    expect(recordNameOf("coupon (batch 2)")).toBe("coupon (batch 2)");
  });

  it("says typed in and former member when the author is gone", () => {
    expect(
      libraryProvenanceText({ ...fitted, provenance: { kind: "typed" }, createdBy: null }),
    ).toBe("typed in by a former member, 2026-12-03");
  });

  it("labels the added set with the library name", () => {
    const choice = toLibraryChoice(fitted, "Lab");
    expect(choice.params.label).toBe("SMC fit December");
    expect(choice.params.E1).toBe(11000);
    expect(choice.key).toBe(`library:${fitted.id}`);
    expect(choice.team).toBe("Lab");
  });
});
